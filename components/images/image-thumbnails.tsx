import Link from "next/link";
import { NearDuplicateNote } from "./image-details";
import { formatPixels, imageName, KIND_LABELS, type SourceImage, thumbnailUrl, viewerPath } from "./image-types";

// Thumbnails of ready photographs: the source page's gallery cards and the viewer's strip. Each one
// opens the viewer.

export function ImageCard({ image }: { image: SourceImage }) {
  const name = imageName(image);
  const pixels = formatPixels(image.width, image.height);
  return (
    <li className="flex flex-col gap-2">
      <Link
        href={viewerPath(image.sourceId, image.id)}
        className="group flex aspect-square items-center justify-center overflow-hidden rounded border border-rule bg-paper-deep p-2 hover:border-accent"
      >
        <img src={thumbnailUrl(image.id)} alt={`${name}: open in the viewer`} loading="lazy" className="max-h-full max-w-full object-contain shadow-sm" />
      </Link>
      <div className="text-sm">
        <p className="font-semibold leading-snug">{name}</p>
        <p className="text-ink-faint">
          {KIND_LABELS[image.kind]} · <span className="font-mono text-xs">image {image.id}</span>
        </p>
        {pixels && <p className="font-mono text-xs text-ink-faint">{pixels}</p>}
        <NearDuplicateNote image={image} />
      </div>
    </li>
  );
}

// The viewer's strip: the source's ready photographs in a row, to step from one to the next in the viewer.

export type StripImage = { id: number; sourceId: number; caption: string | null; originalFilename: string };

export function ImageStrip({ images, current }: { images: StripImage[]; current: number }) {
  return (
    <nav aria-label="Other photographs of this source">
      <h2 className="mb-2 text-xl">All photographs of this source</h2>
      <ul className="flex gap-3 overflow-x-auto pb-2">
        {images.map((image) => {
          const here = image.id === current;
          const name = image.caption || image.originalFilename;
          return (
            <li key={image.id} className="shrink-0">
              <Link
                href={viewerPath(image.sourceId, image.id)}
                aria-current={here ? "page" : undefined}
                className={`flex h-28 w-28 items-center justify-center overflow-hidden rounded border-2 bg-paper-deep p-1 ${
                  here ? "border-accent" : "border-rule hover:border-accent"
                }`}
              >
                <img src={thumbnailUrl(image.id)} alt={name} loading="lazy" className="max-h-full max-w-full object-contain" />
              </Link>
              <p aria-hidden="true" className="mt-1 w-28 truncate text-xs text-ink-soft">
                {name}
              </p>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
