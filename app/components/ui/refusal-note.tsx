/** What the server refused, said once where the person acted: the sentence, each problem, and a way on. */
export function RefusalNote({ error, problems = [], children }: { error: string; problems?: string[]; children?: React.ReactNode }) {
  return (
    <div role="alert" className="mb-3 rounded-md border-4 border-stop bg-paper p-3">
      <p className="font-bold text-stop">{error}</p>
      {problems.length ? (
        <ul className="mt-2 list-disc space-y-1 pl-6">
          {problems.map((p) => (
            <li key={p}>{p}</li>
          ))}
        </ul>
      ) : null}
      {children}
    </div>
  );
}
