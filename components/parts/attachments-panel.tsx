"use client";

import { useRef, useState } from "react";
import { ATTACHMENT_TYPES, MAX_ATTACHMENT_BYTES } from "@/lib/attachments";
import { buttonClass, inputClass } from "./labels";
import { useAttachmentMutations, useAttachments } from "./use-attachments";

const ACCEPT = Object.values(ATTACHMENT_TYPES).map((t) => t.contentType).join(",");

function size(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(0)} kB`;
  return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}

/** Datasheets and photos of a part: list, download, and (owner or admin) upload and remove. */
export function AttachmentsPanel({ partId, canEdit }: { partId: string; canEdit: boolean }) {
  const list = useAttachments(partId);
  const { upload, remove } = useAttachmentMutations(partId);
  const input = useRef<HTMLInputElement>(null);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);

  const onUpload = async () => {
    const file = input.current?.files?.[0];
    if (!file) {
      setMessage({ ok: false, text: "Choose a file first." });
      return;
    }
    // Checked here to save a slow upload; the server checks again (and reads the bytes).
    if (file.size > MAX_ATTACHMENT_BYTES) {
      setMessage({ ok: false, text: `${file.name} is ${size(file.size)}; the limit is 10 MB.` });
      return;
    }
    try {
      const saved = await upload.mutateAsync(file);
      setMessage({ ok: true, text: `Attached ${saved.filename}.` });
      if (input.current) input.current.value = "";
    } catch (e) {
      setMessage({ ok: false, text: e instanceof Error ? e.message : "Upload failed." });
    }
  };

  return (
    <section aria-labelledby="attachments-heading" className="space-y-3">
      <h2 id="attachments-heading" className="text-lg font-medium">Attachments</h2>
      {list.isPending && <p className="text-sm text-ink-soft">Loading attachments…</p>}
      {list.isError && <p role="alert" className="text-sm text-over">{list.error.message}</p>}
      {list.data && list.data.length === 0 && <p className="text-sm text-ink-soft">No datasheet or photo yet.</p>}
      {list.data && list.data.length > 0 && (
        <ul className="divide-y divide-line rounded-lg border border-line bg-white/70" aria-label="Attachments">
          {list.data.map((a) => (
            <li key={a.id} className="flex items-center gap-3 px-3 py-2 text-sm">
              <a href={a.url} className="font-medium text-ink hover:text-ember" target="_blank" rel="noreferrer">{a.filename}</a>
              <span className="text-xs text-ink-soft">{a.contentType.split("/")[1]?.toUpperCase()} · {size(a.sizeBytes)}</span>
              {canEdit && (
                <button type="button" className="ml-auto text-xs text-ink-soft hover:text-over" disabled={remove.isPending} onClick={() => remove.mutate(a)}>
                  Remove
                </button>
              )}
            </li>
          ))}
        </ul>
      )}
      {canEdit && (
        <div className="flex flex-wrap items-center gap-3">
          <label className="text-sm">
            <span className="sr-only">Datasheet or photo</span>
            <input ref={input} type="file" accept={ACCEPT} aria-label="Datasheet or photo" className={inputClass} />
          </label>
          <button type="button" className={buttonClass} onClick={onUpload} disabled={upload.isPending}>
            {upload.isPending ? "Uploading…" : "Upload"}
          </button>
          <span className="text-xs text-ink-soft">PDF, PNG, JPEG or WebP, at most 10 MB.</span>
        </div>
      )}
      {message && <p role="status" className={`text-sm ${message.ok ? "text-ok" : "text-over"}`}>{message.text}</p>}
    </section>
  );
}
