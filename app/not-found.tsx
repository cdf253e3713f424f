import Link from "next/link";

export default function NotFound() {
  return (
    <div className="max-w-prose">
      <h1 className="text-3xl">Page not found</h1>
      <p className="mt-3">The address may be mistyped, or the page has moved.</p>
      <p className="mt-3"><Link href="/">Riser home</Link></p>
    </div>
  );
}
