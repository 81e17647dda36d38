import { regionUrl } from "@/lib/iiif/fragments";
import type { Box, RegionShape } from "@/lib/regions/types";

/** A box around the given ones with a margin, kept inside the photograph, so shapes show in context. */
export function cropAround(boxes: Box[], image: { width: number; height: number }, margin = 0.08): Box {
  const x0 = Math.min(...boxes.map((b) => b.x));
  const y0 = Math.min(...boxes.map((b) => b.y));
  const x1 = Math.max(...boxes.map((b) => b.x + b.w));
  const y1 = Math.max(...boxes.map((b) => b.y + b.h));
  const pad = Math.round(Math.max(x1 - x0, y1 - y0) * margin);
  const x = Math.max(0, x0 - pad);
  const y = Math.max(0, y0 - pad);
  return { x, y, w: Math.max(1, Math.min(image.width, x1 + pad) - x), h: Math.max(1, Math.min(image.height, y1 + pad) - y) };
}

function Outline({ shape }: { shape: RegionShape }) {
  const common = { fill: "none", stroke: "currentColor", strokeWidth: 3, vectorEffect: "non-scaling-stroke" as const };
  if (shape.kind === "rectangle") return <rect x={shape.x} y={shape.y} width={shape.w} height={shape.h} {...common} />;
  return <polygon points={shape.points.map(([x, y]) => `${x},${y}`).join(" ")} {...common} />;
}

/**
 * The part `area` of the photograph from the IIIF image service, confined to size × size, with the
 * region's outline drawn over it in the photograph's own pixel coordinates.
 */
export function RegionCrop({ imageId, area, shape, size = 600, alt }: { imageId: number; area: Box; shape: RegionShape; size?: number; alt: string }) {
  const scale = Math.min(size / area.w, size / area.h);
  const width = Math.max(1, Math.round(area.w * scale));
  const height = Math.max(1, Math.round(area.h * scale));
  return (
    <div className="relative inline-block max-w-full border border-rule bg-paper-deep" style={{ width }}>
      {/* The IIIF service scales the crop itself; an optimiser in between would only re-encode it. */}
      <img src={regionUrl(`/iiif/3/${imageId}`, area, { width: size, height: size })} alt={alt} width={width} height={height} loading="lazy" className="block h-auto w-full" />
      <svg
        viewBox={`${area.x} ${area.y} ${area.w} ${area.h}`}
        preserveAspectRatio="none"
        className="pointer-events-none absolute inset-0 h-full w-full text-accent"
        aria-hidden="true"
      >
        <Outline shape={shape} />
      </svg>
    </div>
  );
}
