import Link from "next/link";
import type { ReactNode } from "react";
import { rightsLabel } from "@/lib/catalogue/rights";
import { formatBytes, formatPixels, KIND_LABELS, type SourceImage, viewerPath } from "./image-types";

// What is known of the photograph itself (not of the work it shows): the viewer's side panel, and the
// notes on a likely second photograph or a failed processing that every image list shows.

function Row({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="border-b border-rule py-2">
      <dt className="text-xs font-semibold uppercase tracking-wider text-ink-faint">{label}</dt>
      <dd className="mt-0.5">{children}</dd>
    </div>
  );
}

const unstated = <span className="text-ink-faint">Not stated</span>;

export function ImageDetails({ image }: { image: SourceImage }) {
  const pixels = formatPixels(image.width, image.height);
  return (
    <aside aria-labelledby="image-details-heading" className="text-sm">
      <h2 id="image-details-heading" className="mb-2 text-xl">
        About this photograph
      </h2>
      <dl>
        <Row label="Caption">{image.caption ?? unstated}</Row>
        <Row label="Kind">{KIND_LABELS[image.kind]}</Row>
        <Row label="Photo credit">{image.photoCredit ?? unstated}</Row>
        <Row label="Rights">
          {image.rightsUri ? (
            <a href={image.rightsUri} rel="license">
              {rightsLabel(image.rightsUri) ?? image.rightsUri}
            </a>
          ) : (
            <span className="text-ink-faint">Not stated; ask the holding institution</span>
          )}
        </Row>
        <Row label="Original size">
          <span className="font-mono">{pixels ?? "not known yet"}</span>
          {image.byteSize !== null && <span className="block font-mono text-xs text-ink-faint">{formatBytes(image.byteSize)}{image.mimeType && ` · ${image.mimeType}`}</span>}
        </Row>
        <Row label="File name">
          <span className="break-all font-mono text-xs">{image.originalFilename}</span>
        </Row>
        <Row label="Image number">
          <span className="font-mono">{image.id}</span>
        </Row>
      </dl>
      <div className="mt-2">
        <NearDuplicateNote image={image} />
      </div>
    </aside>
  );
}

// A likely second photograph of a work already in the archive: a warning for the cataloguer, not a
// refusal (a new photograph can show what an old one hid).
export function NearDuplicateNote({ image }: { image: Pick<SourceImage, "nearDuplicate" | "nearDuplicateOf"> }) {
  const twin = image.nearDuplicate;
  if (!twin && !image.nearDuplicateOf) return null;
  return (
    <p className="text-sm text-warn" data-testid="near-duplicate">
      <span aria-hidden="true">⚠ </span>
      {twin ? (
        <>
          This may be another photograph of{" "}
          <Link href={viewerPath(twin.sourceId, twin.imageId)} className="text-warn underline">
            image {twin.imageId} of “{twin.sourceTitle}”
          </Link>
          .
        </>
      ) : (
        // The server names the twin only when the caller may see its source.
        <>This may be another photograph of an image already in the archive, in a source you cannot see.</>
      )}
    </p>
  );
}

/** Why processing failed, in the server's words, or a plain fallback. */
export function FailureNote({ reason }: { reason: string | null }) {
  return <p className="text-sm text-warn">Processing failed: {reason ?? "the server gave no reason."}</p>;
}
