import { useTranslation } from "react-i18next";
import { useSay } from "~/components/ui/say";
import { FieldMathInputError } from "~/lib/field-math/validate";

/** Runs a calculator on what the person typed: a result, or each bad field's message. */
export function tryFieldMath<T>(fn: (input: unknown) => T, input: unknown): { result: T | null; errors: Record<string, string> } {
  try {
    return { result: fn(input), errors: {} };
  } catch (error) {
    if (error instanceof FieldMathInputError) return { result: null, errors: error.fields };
    throw error;
  }
}

/**
 * "12" → 12, "1,200" → 1200, "1,5" → 1.5 (a decimal comma, as many phones type it); "" or "abc" →
 * NaN (which the calculators reject by name). A comma followed by exactly three digits groups thousands.
 */
export function toNumber(s: string): number {
  const t = s.trim();
  if (t === "") return Number.NaN;
  if (/^[-+]?\d{1,3}(,\d{3})+(\.\d+)?$/.test(t)) return Number(t.replace(/,/g, ""));
  if (/^[-+]?\d+,\d+$/.test(t)) return Number(t.replace(",", "."));
  return Number(t);
}

export function NumberField({
  id,
  label,
  value,
  onChange,
  unit,
  beside,
  error,
}: {
  id: string;
  label: string;
  value: string;
  onChange: (v: string) => void;
  unit: string;
  beside?: string;
  error?: string;
}) {
  const say = useSay();
  return (
    <div>
      <label htmlFor={id} className="block font-bold">
        {label}
      </label>
      <div className="mt-1 flex items-center gap-2">
        <input
          id={id}
          value={value}
          onChange={(e) => onChange(e.target.value)}
          inputMode="decimal"
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          className="block min-h-14 w-full min-w-0 rounded-md border-2 border-ink bg-paper px-3 text-lg aria-[invalid=true]:border-4 aria-[invalid=true]:border-stop"
        />
        <span className="min-w-10 shrink-0 text-base">{unit}</span>
      </div>
      {beside ? <p className="text-sm">{beside}</p> : null}
      {error ? (
        <p id={`${id}-error`} className="mt-1 font-bold text-stop">
          {say(error)}
        </p>
      ) : null}
    </div>
  );
}

export function ResultBox({ children, tone = "plain" }: { children: React.ReactNode; tone?: "plain" | "good" | "warn" | "bad" }) {
  const tones = { plain: "border-ink", good: "border-go", warn: "border-ink bg-caution", bad: "border-stop" };
  return (
    <div role="status" aria-live="polite" className={`rounded-lg border-4 bg-paper p-4 ${tones[tone]}`}>
      {children}
    </div>
  );
}

/** Where a figure comes from: one line to open, so the crew reads the figure and the trainer can check it. */
export function SourceNote({ children }: { children: React.ReactNode }) {
  const { t } = useTranslation();
  return (
    <details className="mt-2 text-sm">
      <summary className="min-h-10 cursor-pointer py-2 font-bold">{t("fm.source")}</summary>
      {/* The sources are named as published (in English). */}
      <p lang="en">{children}</p>
    </details>
  );
}
