import Link from "next/link";

/** One figure of the admin overview, linking to the screen behind it. */
export function Figure({ label, value, href, warn }: { label: string; value: React.ReactNode; href: string; warn?: boolean }) {
  return (
    <li className="rounded border border-line bg-panel p-4">
      <Link href={href} className="block text-ink no-underline hover:underline">
        <span className="block text-sm text-muted">{label}</span>
        <span className={`block font-mono text-3xl ${warn ? "text-caution" : ""}`}>{value}</span>
      </Link>
    </li>
  );
}
