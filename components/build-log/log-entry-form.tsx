"use client";
// A new build-log entry: its kind, what happened, the parts it concerns and site photos. Sent as
// multipart with upload progress (a phone on site may be slow); the server checks every photo
// and keeps nothing of a refused upload.
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useRef, useState, type FormEvent } from "react";
import { failureOf } from "@/components/api/request-json";
import { uploadForm } from "@/components/api/upload-form";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";

const KIND_LABEL: Record<string, string> = {
  note: "Note",
  cut: "Cut",
  assembled: "Assembled",
  shipped: "Shipped",
  installed: "Installed",
  inspection: "Inspection",
  problem: "Problem",
  fixed: "Fixed",
};

const MB = 1024 * 1024;

export function LogEntryForm({ projectId, kinds, photos }: { projectId: number; kinds: string[]; photos: boolean }) {
  const router = useRouter();
  const form = useRef<HTMLFormElement>(null);
  const [files, setFiles] = useState<File[]>([]);
  const [progress, setProgress] = useState<number | null>(null);
  const add = useMutation({
    mutationFn: (data: FormData) =>
      uploadForm<{ photos?: unknown[] }>(`/api/projects/${projectId}/log`, data, setProgress),
    onMutate: () => setProgress(0),
    onSettled: () => setProgress(null),
    onSuccess: () => {
      form.current?.reset();
      setFiles([]);
      router.refresh();
    },
  });
  const failure = failureOf(add.error);
  const fields = failure?.fields;
  const message =
    failure?.message ??
    (add.data
      ? `Added to the build log${add.data.photos?.length ? ` with ${add.data.photos.length} photo(s)` : ""}.`
      : null);

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const data = new FormData(e.currentTarget);
    data.delete("photos[]");
    for (const f of files) data.append("photos[]", f, f.name);
    add.mutate(data);
  }

  const total = files.reduce((n, f) => n + f.size, 0);
  return (
    <form
      ref={form}
      onSubmit={submit}
      className="flex flex-col gap-3"
      aria-label="Add to the build log"
      data-testid="log-entry-form"
    >
      <div className="grid gap-3 sm:grid-cols-[12rem_1fr]">
        <SelectField
          label="Kind"
          name="kind"
          defaultValue={kinds[0]}
          options={kinds.map((k) => ({ value: k, label: KIND_LABEL[k] ?? k }))}
          errors={fields?.kind}
        />
        <TextField
          label="Parts (ids as engraved)"
          name="parts"
          placeholder="e.g. T01, T02"
          errors={fields?.parts}
          hint="Optional: the part ids this entry concerns."
        />
      </div>
      <div className="flex flex-col gap-1 text-sm">
        <label htmlFor="log-text" className="font-medium">
          What happened
        </label>
        <textarea
          id="log-text"
          name="text"
          rows={3}
          maxLength={4000}
          className="w-full rounded-plate border border-ink-line bg-white/70 px-2.5 py-1.5 text-sm"
          aria-describedby="log-text-error"
        />
        <div id="log-text-error" aria-live="polite">
          {fields?.text?.map((m) => (
            <p key={m} className="text-xs font-medium text-caution-ink">
              {m}
            </p>
          ))}
        </div>
      </div>
      {photos ? (
        <div className="flex flex-col gap-1 text-sm">
          <label htmlFor="log-photos" className="font-medium">
            Site photos
          </label>
          <input
            id="log-photos"
            name="photos[]"
            type="file"
            multiple
            accept="image/jpeg,image/png,image/webp"
            capture="environment"
            onChange={(e) => setFiles([...(e.target.files ?? [])])}
            className="text-sm"
          />
          <p className="text-xs text-ink-soft">
            JPEG, PNG or WebP; up to 6 photos, each at most 15 MB and 40 megapixels. Location and camera data are
            removed.
          </p>
          {files.length ? (
            <ul className="font-mono text-xs">
              {files.map((f) => (
                <li key={f.name + f.size} className={f.size > 15 * MB ? "text-caution-ink" : ""}>
                  {f.name} · {(f.size / MB).toFixed(1)} MB{f.size > 15 * MB ? " — too large" : ""}
                </li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
      {progress !== null ? (
        <div className="flex flex-col gap-1">
          <div
            role="progressbar"
            aria-label="Uploading"
            aria-valuemin={0}
            aria-valuemax={100}
            aria-valuenow={Math.round(progress * 100)}
            className="h-2 w-full overflow-hidden rounded-plate bg-paper-deep"
          >
            <div className="h-full bg-ink" style={{ width: `${progress * 100}%` }} />
          </div>
          <p className="text-xs text-ink-soft">
            {progress < 1
              ? `Uploading ${(total / MB).toFixed(1)} MB… ${Math.round(progress * 100)} %`
              : "Checking the photos…"}
          </p>
        </div>
      ) : null}
      <div>
        <Button type="submit" disabled={progress !== null}>
          Add to the log
        </Button>
      </div>
      {message ? (
        <Notice tone={failure ? "problem" : "done"} testId="log-message">
          {message}
        </Notice>
      ) : null}
    </form>
  );
}
