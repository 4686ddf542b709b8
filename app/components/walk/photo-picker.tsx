import { useState } from "react";
import { useTranslation } from "react-i18next";
import type { QueuedPhoto } from "~/lib/walk/queue";

/**
 * Adds photos to the case at the current step. A photo is kept on the phone first and sent when
 * there is signal, with its progress shown; a refusal is said beside the photo.
 */
export function PhotoPicker({
  caseId,
  photos,
  progress,
  online,
  onTake,
}: {
  caseId: string;
  photos: QueuedPhoto[];
  progress: Record<string, number>;
  online: boolean;
  /** Keeps the photo; answers what is wrong with it, or null once kept. */
  onTake: (file: File) => Promise<string | null>;
}) {
  const [problem, setProblem] = useState<string | null>(null);
  const { t } = useTranslation();
  return (
    <div>
      <label className="flex min-h-12 w-fit items-center rounded-md border-2 border-ink bg-paper px-3 font-bold">
        {t("photo.add")}
        <input
          type="file"
          accept="image/*"
          capture="environment"
          className="sr-only"
          onChange={(e) => {
            const file = e.target.files?.[0];
            e.target.value = "";
            if (file) void onTake(file).then(setProblem);
          }}
        />
      </label>
      {problem ? <p className="mt-1 font-bold text-stop">{problem}</p> : null}
      <ul className="mt-2 space-y-2">
        {photos.map((p, i) => (
          <li key={p.id} className="flex items-center gap-3">
            {p.sentAs ? (
              <img
                src={`/cases/${caseId}/photos/${p.sentAs}`}
                alt={t("photo.alt", { n: i + 1 })}
                className="h-16 w-16 rounded border-2 border-ink object-cover"
              />
            ) : null}
            <span>
              {p.name}:{" "}
              {p.error ? (
                <strong className="text-stop">{p.error}</strong>
              ) : p.sentAs ? (
                t("photo.saved")
              ) : online && progress[p.id] !== undefined ? (
                <progress max={100} value={progress[p.id]} aria-label={t("photo.sending", { name: p.name })}>
                  {progress[p.id]}%
                </progress>
              ) : (
                t("photo.kept")
              )}
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}
