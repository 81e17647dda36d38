"use client";

// Adds photographs to a source: describe the batch, drop or choose files, watch each one go up,
// get checked and processed. The browser's type filter is only a convenience: the server reads
// each file's bytes and refuses what is not a photograph, and that refusal is shown here.
import { useEffect, useMemo, useState } from "react";
import { useDropzone } from "react-dropzone";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { RIGHTS } from "@/lib/catalogue/rights";
import { ACCEPTED_LABEL, ACCEPTED_TYPES } from "@/lib/images/schemas";
import { KIND_LABELS, type ImageKind, type SourceImage } from "./image-types";
import { UploadRow } from "./upload-row";
import { PARALLEL_UPLOADS, useUploadQueue, type BatchDetails } from "./use-upload-queue";

type Props = {
  sourceId: number;
  /** The source's images as last polled, to follow accepted uploads through processing. */
  images: SourceImage[];
  /** Called when the server has accepted an upload (it is then waiting for processing). */
  onAccepted(imageId: number): void;
  /** The ids of the uploads this list follows, so the page need not show them twice. */
  onTracked?(imageIds: number[]): void;
};

const GROUPS = [...new Set(RIGHTS.map((r) => r.group))];
const EMPTY: BatchDetails = { kind: "whole", caption: "", photoCredit: "", rightsUri: "" };
const accept = Object.fromEntries(ACCEPTED_TYPES.map((t) => [t, []]));

export function ImageUploader({ sourceId, images, onAccepted, onTracked }: Props) {
  const [details, setDetails] = useState<BatchDetails>(EMPTY);
  const queue = useUploadQueue(sourceId, onAccepted);
  const byId = useMemo(() => new Map(images.map((i) => [i.id, i])), [images]);
  const set = (field: keyof BatchDetails) => (e: { target: { value: string } }) => setDetails((d) => ({ ...d, [field]: e.target.value }));

  const { getRootProps, getInputProps, isDragActive, open } = useDropzone({
    accept,
    multiple: true,
    noClick: true,
    noKeyboard: true,
    // Files outside `accept` go up too: the server, not the file name, decides what they are.
    onDrop: (accepted, rejected) => queue.add([...accepted, ...rejected.map((r) => r.file)], details),
  });

  const trackedKey = queue.items.flatMap((i) => (i.imageId !== null ? [i.imageId] : [])).join(",");
  useEffect(() => {
    onTracked?.(trackedKey ? trackedKey.split(",").map(Number) : []);
  }, [trackedKey, onTracked]);

  const ready = queue.items.filter((i) => i.imageId !== null && byId.get(i.imageId)?.state === "ready").length;
  const refused = queue.items.filter((i) => i.phase === "refused" || i.phase === "broken").length;
  const cancelled = queue.items.filter((i) => i.phase === "cancelled").length;

  return (
    <section aria-labelledby="uploader-heading" className="rounded border border-rule bg-card p-4">
      <h3 id="uploader-heading" className="text-xl">
        Add photographs
      </h3>
      <p className="mt-1 text-sm text-ink-soft">These details go with every file you add next; you can change them between batches.</p>
      <div className="mt-3 grid gap-3 sm:grid-cols-2">
        <SelectField label="Kind of photograph" value={details.kind} onChange={set("kind")}>
          {(Object.keys(KIND_LABELS) as ImageKind[]).map((k) => (
            <option key={k} value={k}>
              {KIND_LABELS[k]}
            </option>
          ))}
        </SelectField>
        <TextField label="Caption" value={details.caption} onChange={set("caption")} maxLength={300} hint="For example “left hand of the player, showing the frets”." />
        <TextField label="Photo credit" value={details.photoCredit} onChange={set("photoCredit")} maxLength={300} hint="Who took the photograph, and for whom." />
        <SelectField label="Rights of the photograph" value={details.rightsUri} onChange={set("rightsUri")}>
          <option value="">Not stated</option>
          {GROUPS.map((group) => (
            <optgroup key={group} label={group}>
              {RIGHTS.filter((r) => r.group === group).map((r) => (
                <option key={r.uri} value={r.uri}>
                  {r.label}
                </option>
              ))}
            </optgroup>
          ))}
        </SelectField>
      </div>

      <div
        {...getRootProps({
          className: `mt-4 flex flex-col items-center gap-2 rounded border-2 border-dashed px-4 py-8 text-center transition-colors ${
            isDragActive ? "border-accent bg-accent-wash" : "border-rule bg-paper"
          }`,
          role: "group",
          "aria-label": "Drop zone for photographs",
        })}
        data-testid="image-drop-zone"
      >
        <input {...getInputProps()} aria-label="Photographs to upload" />
        <p className="font-serif text-lg">{isDragActive ? "Drop to start uploading" : "Drop photographs here"}</p>
        <p className="text-sm text-ink-faint">or</p>
        <Button type="button" onClick={open}>
          Choose files
        </Button>
        <p className="text-sm text-ink-faint">
          {ACCEPTED_LABEL}; several at once, {PARALLEL_UPLOADS} uploading at a time. Each file is checked after upload.
        </p>
      </div>

      {queue.items.length > 0 && (
        <>
          <p className="mt-4 text-sm text-ink-soft" aria-live="polite">
            <span className="font-mono">{ready}</span> of <span className="font-mono">{queue.items.length}</span> ready
            {refused > 0 && <span className="text-warn"> · {refused} not accepted</span>}
            {cancelled > 0 && <span> · {cancelled} cancelled</span>}
          </p>
          <ul aria-label="Uploads" className="mt-2 divide-y divide-rule rounded border border-rule bg-card">
            {queue.items.map((item) => (
              <UploadRow
                key={item.key}
                item={item}
                image={item.imageId !== null ? byId.get(item.imageId) : undefined}
                onCancel={() => queue.cancel(item.key)}
                onRetry={() => queue.retry(item.key)}
                onDismiss={() => queue.dismiss(item.key)}
              />
            ))}
          </ul>
        </>
      )}
    </section>
  );
}
