"use client";

import Link from "next/link";
import { useId } from "react";
import { Button } from "@/components/ui/button";
import { NearDuplicateNote } from "./image-details";
import { formatBytes, type SourceImage, thumbnailUrl, viewerPath } from "./image-types";
import { CANCELLABLE, type UploadItem } from "./use-upload-queue";

type Props = {
  item: UploadItem;
  /** The image as the server lists it, once the upload has been accepted. */
  image: SourceImage | undefined;
  onCancel(): void;
  onRetry(): void;
  onDismiss(): void;
};

// The browser's own bar ignores our palette: draw it in paper and the accent green.
const BAR =
  "mt-1 h-2 w-full appearance-none overflow-hidden rounded-full bg-paper-deep [&::-webkit-progress-bar]:bg-paper-deep [&::-webkit-progress-value]:bg-accent [&::-webkit-progress-value]:transition-all [&::-moz-progress-bar]:bg-accent";

const percent = (item: UploadItem) => (item.file.size ? Math.floor((item.sent / item.file.size) * 100) : 100);

/** The state in words; `live` leaves out the percentage so screen readers are not told every step. */
function stateText(item: UploadItem, image: SourceImage | undefined, live = false): string {
  switch (item.phase) {
    case "queued":
      return "waiting to upload";
    case "starting":
      return "starting the upload";
    case "uploading":
      return live ? "uploading" : `uploading ${percent(item)} %`;
    case "checking":
      return "checking the file";
    case "refused":
      return `refused: ${item.message}`;
    case "broken":
      return `failed: ${item.message}`;
    case "cancelled":
      return "cancelled; nothing was kept";
    case "accepted":
      if (!image || image.state === "waiting" || image.state === "uploading") return "waiting for processing";
      if (image.state === "failed") return `failed: ${image.failureReason ?? "processing failed"}`;
      return image.state === "ready" && image.width && image.height ? `ready · ${image.width.toLocaleString("en")} × ${image.height.toLocaleString("en")} px` : image.state;
  }
}

export function UploadRow({ item, image, onCancel, onRetry, onDismiss }: Props) {
  const id = useId();
  const ready = item.phase === "accepted" && image?.state === "ready";
  const bad = item.phase === "refused" || item.phase === "broken" || (item.phase === "accepted" && image?.state === "failed");
  const finished = ready || bad || item.phase === "cancelled";
  const showBar = !ready && !bad && item.phase !== "cancelled";
  // Indeterminate (no value) while the server works and the amount of work left is unknown.
  const determinate = item.phase === "queued" || item.phase === "starting" || item.phase === "uploading";

  return (
    <li className="grid grid-cols-[4rem_1fr] gap-3 px-4 py-3 sm:grid-cols-[4rem_1fr_auto]" data-testid="upload-row">
      <div className="flex h-16 w-16 items-center justify-center overflow-hidden rounded border border-rule bg-paper-deep">
        {ready && image ? (
          <Link href={viewerPath(image.sourceId, image.id)} aria-label={`Open ${item.file.name} in the viewer`}>
            <img src={thumbnailUrl(image.id)} alt="" className="h-16 w-16 object-cover" />
          </Link>
        ) : (
          <span aria-hidden="true" className="font-mono text-xs text-ink-faint">
            {item.file.name.split(".").pop()?.slice(0, 4).toUpperCase() || "FILE"}
          </span>
        )}
      </div>
      <div className="min-w-0">
        <p className="flex flex-wrap items-baseline gap-x-3">
          <span id={`${id}-name`} className="truncate font-semibold">
            {item.file.name}
          </span>
          <span className="font-mono text-xs text-ink-faint">{formatBytes(item.file.size)}</span>
        </p>
        {showBar && (
          <progress
            aria-labelledby={`${id}-name`}
            aria-describedby={`${id}-state`}
            max={100}
            {...(determinate ? { value: item.phase === "uploading" ? percent(item) : 0 } : {})}
            className={`${BAR} ${determinate ? "" : "animate-pulse [&::-webkit-progress-bar]:bg-accent-wash"}`}
          />
        )}
        <p id={`${id}-state`} data-testid="upload-state" className={`mt-1 text-sm ${bad ? "text-warn" : ready ? "text-accent" : "text-ink-soft"}`}>
          {stateText(item, image)}
          {item.duplicateUrl && (
            <>
              {" "}
              <Link href={item.duplicateUrl} className="text-warn underline">
                See the image already in the archive
              </Link>
            </>
          )}
        </p>
        <span className="sr-only" aria-live="polite">
          {item.file.name}: {stateText(item, image, true)}
        </span>
        {image && <NearDuplicateNote image={image} />}
      </div>
      <div className="col-span-2 flex flex-wrap items-start gap-2 sm:col-span-1">
        {CANCELLABLE.includes(item.phase) && (
          <Button type="button" variant="quiet" aria-label={`Cancel upload of ${item.file.name}`} onClick={onCancel}>
            Cancel
          </Button>
        )}
        {(item.retryable || item.phase === "cancelled") && (
          <Button type="button" variant="quiet" aria-label={`Retry upload of ${item.file.name}`} onClick={onRetry}>
            Retry
          </Button>
        )}
        {finished && (
          <Button type="button" variant="quiet" aria-label={`Remove ${item.file.name} from this list`} onClick={onDismiss} className="px-2">
            Remove
          </Button>
        )}
      </div>
    </li>
  );
}
