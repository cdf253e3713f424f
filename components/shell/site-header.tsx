import Link from "next/link";
import { LanguageSwitch } from "./language-switch";
import { SiteNav } from "./site-nav";

/** The product's name: the same in every language. */
const BRAND = "Riser";

export function SiteHeader() {
  return (
    <header className="on-dark border-b-4 border-copper bg-ink text-paper">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3 sm:px-6">
        <Link href="/" className="flex items-center gap-2 text-xl font-bold text-paper no-underline">
          <RiserMark />
          <span>{BRAND}</span>
        </Link>
        <SiteNav />
        <LanguageSwitch />
      </div>
    </header>
  );
}

/** Riser's mark: a vertical pipe with a gauge and a deflector. */
function RiserMark() {
  return (
    <svg width="28" height="28" viewBox="0 0 28 28" aria-hidden="true" focusable="false">
      <rect className="fill-copper-bright" x="12" y="6" width="4" height="20" />
      <circle className="stroke-paper" cx="20" cy="15" r="3.5" fill="none" strokeWidth="2" />
      <line className="stroke-paper" x1="16" y1="15" x2="16.5" y2="15" strokeWidth="2" />
      <path className="stroke-paper" d="M6 5 L22 5" strokeWidth="2.5" strokeLinecap="round" />
      <path className="stroke-paper" d="M14 5 L14 2" strokeWidth="2" />
    </svg>
  );
}
