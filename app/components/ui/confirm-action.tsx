import { Form } from "react-router";

/**
 * An action that cannot be undone in one tap: the first tap opens the question, the second
 * (a button that says exactly what happens) sends it with `confirmed=yes`, which the server
 * requires. A <details> element, so it works before the scripts load and with no hover.
 */
export function ConfirmAction({
  label,
  question,
  confirmLabel,
  intent,
  hidden = {},
  disabled,
  children,
}: {
  label: string;
  question: string;
  confirmLabel: string;
  intent: string;
  hidden?: Record<string, string>;
  disabled?: boolean;
  children?: React.ReactNode;
}) {
  return (
    <details className="group">
      <summary className="flex min-h-12 cursor-pointer list-none items-center rounded-md border-2 border-ink bg-paper px-4 font-bold [&::-webkit-details-marker]:hidden">
        {label}
      </summary>
      <Form method="post" className="mt-2 space-y-3 rounded-md border-2 border-stop bg-paper p-3">
        <p className="font-bold">{question}</p>
        {Object.entries(hidden).map(([k, v]) => (
          <input key={k} type="hidden" name={k} value={v} />
        ))}
        <input type="hidden" name="confirmed" value="yes" />
        {children}
        <button name="intent" value={intent} disabled={disabled} className="min-h-12 w-full rounded-md bg-stop px-4 font-bold text-white">
          {confirmLabel}
        </button>
      </Form>
    </details>
  );
}
