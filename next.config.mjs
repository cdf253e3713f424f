import createMDX from "@next/mdx";
import { securityHeaders } from "./lib/security-headers.mjs";

const isProd = process.env.NODE_ENV === "production";

/** @type {import('next').NextConfig} */
const nextConfig = {
  distDir: process.env.NEXT_DIST_DIR || ".next",
  pageExtensions: ["ts", "tsx", "md", "mdx"],
  poweredByHeader: false,
  // npm test type-checks the whole project (tsc --noEmit) before building; no second pass here.
  typescript: { ignoreBuildErrors: true },
  experimental: { authInterrupts: true },
  serverExternalPackages: ["mysql2", "nodemailer", "pdf-lib", "@pdf-lib/fontkit", "qrcode"],
  async headers() {
    // Security headers for every response (pages and API); CSP without unsafe-eval in production.
    return [{ source: "/:path*", headers: securityHeaders(isProd) }];
  },
};

const withMDX = createMDX({
  options: {
    remarkPlugins: ["remark-frontmatter", ["remark-mdx-frontmatter", { name: "frontmatter" }], "remark-gfm"],
  },
});

export default withMDX(nextConfig);
