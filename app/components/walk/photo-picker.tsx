import { useState } from "react";

interface Upload {
  name: string;
  progress: number;
  error?: string;
  photoId?: number;
}

/**
 * Adds photos to the case at the current step. XMLHttpRequest rather than fetch, because
 * only it reports upload progress, which matters on a weak signal.
 */
export function PhotoPicker({ caseId, stepId, online }: { caseId: string; stepId: string; online: boolean }) {
  const [uploads, setUploads] = useState<Upload[]>([]);
  const set = (i: number, change: Partial<Upload>) => setUploads((u) => u.map((x, k) => (k === i ? { ...x, ...change } : x)));

  const upload = (file: File) => {
    const index = uploads.length;
    setUploads((u) => [...u, { name: file.name, progress: 0 }]);
    const form = new FormData();
    form.set("stepId", stepId);
    form.set("photo", file);
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/api/cases/${caseId}/photos`);
    xhr.upload.onprogress = (e) => e.lengthComputable && set(index, { progress: Math.round((e.loaded / e.total) * 100) });
    xhr.onload = () => {
      const body = (() => {
        try {
          return JSON.parse(xhr.responseText) as { id?: number; error?: string };
        } catch {
          return {};
        }
      })();
      if (xhr.status >= 200 && xhr.status < 300) set(index, { progress: 100, photoId: body.id });
      else set(index, { error: body.error ?? `Upload refused (${xhr.status}).` });
    };
    xhr.onerror = () => set(index, { error: "No signal: photo not sent. Try again when you have signal." });
    xhr.send(form);
  };

  return (
    <div>
      <label className={`flex min-h-12 w-fit items-center rounded-md border-2 border-ink bg-paper px-3 font-bold ${online ? "" : "opacity-70"}`}>
        Add a photo
        <input
          type="file"
          accept="image/*"
          capture="environment"
          className="sr-only"
          onChange={(e) => {
            const file = e.target.files?.[0];
            if (file) upload(file);
            e.target.value = "";
          }}
        />
      </label>
      {online ? null : <p className="mt-1">Photos need signal; your answers do not.</p>}
      <ul className="mt-2 space-y-2">
        {uploads.map((u, i) => (
          <li key={i} className="flex items-center gap-3">
            {u.photoId ? (
              <img src={`/cases/${caseId}/photos/${u.photoId}`} alt={`Photo ${i + 1}`} className="h-16 w-16 rounded border-2 border-ink object-cover" />
            ) : null}
            <span>
              {u.name}:{" "}
              {u.error ? (
                <strong className="text-stop">{u.error}</strong>
              ) : u.photoId ? (
                "saved"
              ) : (
                <progress max={100} value={u.progress} aria-label={`Uploading ${u.name}`}>
                  {u.progress}%
                </progress>
              )}
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}
