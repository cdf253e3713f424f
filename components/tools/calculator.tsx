import Link from "next/link";

// Placeholder until the calculators land: links to the tool page.
export function Calculator({ id }: { id: string; preset?: Record<string, unknown> }) {
  return (
    <p className="my-4 rounded border border-water bg-water-light p-3">
      Try it: <Link href={`/tools/${id}`}>open the {id.replace(/-/g, " ")} calculator</Link>.
    </p>
  );
}
