export function PageTitle({ title, lead, children }: { title: string; lead?: string; children?: React.ReactNode }) {
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
      <div>
        <h1 className="text-3xl">{title}</h1>
        {lead ? <p className="mt-2 max-w-prose text-muted">{lead}</p> : null}
      </div>
      {children}
    </div>
  );
}
