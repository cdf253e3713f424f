import createMDX from "@next/mdx";
import createNextIntlPlugin from "next-intl/plugin";
import { otherSecurityHeaders } from "./lib/security-headers.mjs";

/** @type {import('next').NextConfig} */
const nextConfig = {
  distDir: process.env.NEXT_DIST_DIR || ".next",
  pageExtensions: ["ts", "tsx", "md", "mdx"],
  poweredByHeader: false,
  // Type errors fail the build. npm test runs `tsc --noEmit` itself just before building and then
  // sets RISER_TYPES_CHECKED so the same sources are not checked twice (scripts/lib/steps.mjs).
  typescript: {
    ignoreBuildErrors: process.env.RISER_TYPES_CHECKED === "1",
    tsconfigPath: process.env.NEXT_TSCONFIG_PATH || "tsconfig.json",
  },
  experimental: { authInterrupts: true },
  // Every page renders per request (script nonces), and Next then streams <title> into the body for
  // ordinary browsers. Screen readers announce the title on load, so it is always sent in <head>.
  htmlLimitedBots: /.*/,
  serverExternalPackages: ["mysql2", "nodemailer", "pdf-lib", "@pdf-lib/fontkit", "qrcode", "prom-client"],
  async headers() {
    // Security headers for every response (pages and API). The Content-Security-Policy comes from
    // proxy.ts: pages need a fresh script nonce per request, which a fixed header cannot carry.
    return [{ source: "/:path*", headers: otherSecurityHeaders }];
  },
};

const withMDX = createMDX({
  options: {
    remarkPlugins: ["remark-frontmatter", ["remark-mdx-frontmatter", { name: "frontmatter" }], "remark-gfm"],
  },
});

// next-intl: the per-request language and message catalogs (i18n/request.ts)
const withNextIntl = createNextIntlPlugin("./i18n/request.ts");

export default withNextIntl(withMDX(nextConfig));
