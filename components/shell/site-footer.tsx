import Link from "next/link";

export function SiteFooter() {
  return (
    <footer className="mt-12 border-t border-line bg-panel">
      <div className="mx-auto max-w-6xl px-4 py-6 text-sm text-muted sm:px-6">
        <p>
          Riser teaches and checks; it does not replace a sprinkler&apos;s listing, the adopted code with its local
          amendments, or the authority having jurisdiction, which govern every installation.
        </p>
        <p className="mt-2">
          <Link href="/verify">Verify a certificate</Link>
        </p>
      </div>
    </footer>
  );
}
