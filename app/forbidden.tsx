import Link from "next/link";

export default function Forbidden() {
  return (
    <div className="max-w-prose">
      <h1 className="text-3xl">Not available to your role</h1>
      <p className="mt-3">This page belongs to another role or another organization. If you need it, ask your training manager.</p>
      <p className="mt-3"><Link href="/learn">Back to my training</Link></p>
    </div>
  );
}
