"use client";

// One place on the light table: the crop, its caption, and the commands to move or remove it. Dragging
// starts from the handle only (native HTML5 drag and drop), so that a drag on the picture pans instead;
// the Move buttons do the same by keyboard.
import type { DragEvent, KeyboardEvent } from "react";
import type { LightTableItem } from "@/lib/light-table/types";
import { cropWidth, type SharedView } from "@/lib/light-table/view";
import { RegionCaption } from "./region-caption";
import { RegionCrop } from "./region-crop";

/** Captions need room to read, even under a narrow crop. */
const MIN_ITEM_WIDTH = 224;
export const DRAG_TYPE = "application/x-cordarium-region";

type Props = {
  item: LightTableItem;
  index: number;
  count: number;
  height: number;
  view: SharedView;
  onView(change: (view: SharedView) => SharedView): void;
  onCropKey(event: KeyboardEvent<HTMLDivElement>): void;
  hintId: string;
  dragging: boolean;
  dropTarget: boolean;
  onDragStart(id: number): void;
  onDragEnd(): void;
  onDragOver(id: number): void;
  onDrop(id: number): void;
  onMove(id: number, by: -1 | 1): void;
  onRemove(id: number): void;
};

const small = "rounded border border-rule bg-card px-2 py-1 text-xs font-semibold text-ink hover:bg-paper-deep disabled:cursor-not-allowed disabled:opacity-50";

export function TableItem(props: Props) {
  const { item, index, count, height, view, dragging, dropTarget } = props;
  const id = item.regionId;
  const name = item.label ? `“${item.label}”` : `region ${id}`;
  const notVetted = item.state !== "vetted";

  const start = (e: DragEvent<HTMLDivElement>) => {
    e.dataTransfer.effectAllowed = "move";
    e.dataTransfer.setData(DRAG_TYPE, String(id));
    e.dataTransfer.setData("text/plain", String(id));
    const figure = e.currentTarget.closest("li");
    if (figure) e.dataTransfer.setDragImage(figure, 24, 24);
    props.onDragStart(id);
  };
  const over = (e: DragEvent<HTMLLIElement>) => {
    e.preventDefault();
    e.dataTransfer.dropEffect = "move";
    props.onDragOver(id);
  };

  return (
    <li
      data-region-id={id}
      aria-label={`${index + 1}. ${name} from ${item.source.title}`}
      onDragOver={over}
      onDrop={(e) => {
        e.preventDefault();
        props.onDrop(id);
      }}
      className={`max-w-full break-inside-avoid rounded border bg-card p-3 print:border-rule ${
        notVetted ? "border-warn" : "border-rule"
      } ${dropTarget ? "outline-3 outline-offset-2 outline-accent outline-dashed" : ""} ${dragging ? "opacity-50" : ""}`}
      style={{ width: Math.max(cropWidth(item.box, height) + 26, MIN_ITEM_WIDTH) }}
    >
      <figure className="m-0 break-inside-avoid">
        <div className="mb-2 flex flex-wrap items-center gap-1 print:hidden">
          <div
            draggable
            onDragStart={start}
            onDragEnd={props.onDragEnd}
            data-testid="drag-handle"
            title="Drag to move"
            className="cursor-grab rounded border border-dashed border-rule px-2 py-1 text-xs font-semibold text-ink-soft active:cursor-grabbing"
          >
            <span aria-hidden="true">⠿ </span>Drag
          </div>
          <button type="button" className={small} disabled={index === 0} onClick={() => props.onMove(id, -1)} aria-label={`Move ${name} left`}>
            ← Move left
          </button>
          <button type="button" className={small} disabled={index === count - 1} onClick={() => props.onMove(id, 1)} aria-label={`Move ${name} right`}>
            Move right →
          </button>
          <button type="button" className={`${small} ml-auto text-warn`} onClick={() => props.onRemove(id)} aria-label={`Remove ${name} from the table`}>
            Remove
          </button>
        </div>
        <RegionCrop item={item} height={height} view={view} onView={props.onView} onKey={props.onCropKey} describedBy={props.hintId} />
        <RegionCaption item={item} />
      </figure>
    </li>
  );
}
