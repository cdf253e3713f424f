/** One titled part of the account page, separated by a rule. */
export function Section({ id, title, lead, children }: { id: string; title: string; lead?: string; children: React.ReactNode }) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-3 border-t border-line pt-6">
      <h2 id={id} className="text-2xl">
        {title}
      </h2>
      {lead ? <p className="max-w-prose text-muted">{lead}</p> : null}
      {children}
    </section>
  );
}
