export function PageTitle({ children, lead }: { children: React.ReactNode; lead?: React.ReactNode }) {
  return (
    <div className="mb-5">
      <h1 className="text-3xl font-bold">{children}</h1>
      {lead ? <p className="mt-1 text-lg">{lead}</p> : null}
    </div>
  );
}
