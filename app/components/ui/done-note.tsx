import { useSay } from "./say";

/** What an action just did, said once at the top of the page (read out by screen readers). */
export function DoneNote({ message }: { message: string | null | undefined }) {
  const say = useSay();
  return message ? (
    <p role="status" className="mb-4 rounded-md border-2 border-ink bg-paper p-3 font-bold">
      {say(message)}
    </p>
  ) : null;
}
