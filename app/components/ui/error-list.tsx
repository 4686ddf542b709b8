import { useSay } from "./say";

/**
 * The one way a screen says what is wrong: the sentence, each problem as a line, and a way on.
 * Shown once where the person acted (a refused form, a guide with problems, a bad filter).
 */
export function ErrorList({ error, problems = [], id, children }: { error: string; problems?: readonly string[]; id?: string; children?: React.ReactNode }) {
  const say = useSay();
  return (
    <div id={id} role="alert" className="mb-3 rounded-md border-4 border-stop bg-paper p-3">
      <p className="font-bold text-stop">{say(error)}</p>
      {problems.length ? (
        <ul className="mt-2 list-disc space-y-1 pl-6">
          {problems.map((p, i) => (
            <li key={i}>{say(p)}</li>
          ))}
        </ul>
      ) : null}
      {children}
    </div>
  );
}
