"use client";

// One region cut from its photograph by the IIIF Image API, at the table's common height, under the
// table's shared view: the picture gets the one transform every crop gets, and a drag here moves them
// all. A polygon is cut by its bounding box and outlined, so the eye sees what was marked.
import { useRef, type KeyboardEvent, type PointerEvent } from "react";
import { regionUrl } from "@/lib/iiif";
import type { LightTableItem } from "@/lib/light-table/types";
import { cropRequestHeight, cropWidth, dragBy, viewTransform, type SharedView } from "@/lib/light-table/view";

type Props = {
  item: LightTableItem;
  height: number;
  view: SharedView;
  onView(change: (view: SharedView) => SharedView): void;
  onKey(event: KeyboardEvent<HTMLDivElement>): void;
  describedBy: string;
};

export function RegionCrop({ item, height, view, onView, onKey, describedBy }: Props) {
  const width = cropWidth(item.box, height);
  const src = regionUrl(`/iiif/3/${item.imageId}`, item.box, { height: cropRequestHeight(item.box, height, view.zoom) });
  const last = useRef<{ x: number; y: number } | null>(null);

  const down = (e: PointerEvent<HTMLDivElement>) => {
    if (e.button !== 0) return;
    e.currentTarget.setPointerCapture(e.pointerId);
    last.current = { x: e.clientX, y: e.clientY };
  };
  const move = (e: PointerEvent<HTMLDivElement>) => {
    if (!last.current) return;
    const dx = e.clientX - last.current.x;
    const dy = e.clientY - last.current.y;
    last.current = { x: e.clientX, y: e.clientY };
    onView((v) => dragBy(v, dx, dy, width, height));
  };
  const up = () => {
    last.current = null;
  };

  const name = item.label ? `“${item.label}”` : `region ${item.regionId}`;
  return (
    // The frame scrolls sideways only for a crop wider than the page; the common height always holds.
    <div className="max-w-full overflow-x-auto print:overflow-visible">
      <div
        tabIndex={0}
        role="application"
        aria-roledescription="zoomable crop"
        aria-label={`Crop of ${name} from ${item.source.title}`}
        aria-describedby={describedBy}
        data-testid="crop"
        onPointerDown={down}
        onPointerMove={move}
        onPointerUp={up}
        onPointerCancel={up}
        onKeyDown={onKey}
        className={`relative touch-none select-none overflow-hidden bg-paper-deep ${view.zoom > 1 ? "cursor-grab active:cursor-grabbing" : ""}`}
        style={{ width, height }}
      >
        <div data-testid="crop-picture" className="absolute inset-0 origin-top-left will-change-transform" style={{ transform: viewTransform(view) }}>
          <img src={src} alt="" width={width} height={height} draggable={false} className="block h-full w-full" />
          {item.shape.kind === "polygon" && (
            <svg
              aria-hidden="true"
              className="absolute inset-0 h-full w-full"
              viewBox={`${item.box.x} ${item.box.y} ${item.box.w} ${item.box.h}`}
              preserveAspectRatio="none"
            >
              <polygon
                points={item.shape.points.map(([x, y]) => `${x},${y}`).join(" ")}
                fill="none"
                stroke="white"
                strokeWidth={2}
                strokeDasharray="6 4"
                vectorEffect="non-scaling-stroke"
              />
            </svg>
          )}
        </div>
      </div>
    </div>
  );
}
