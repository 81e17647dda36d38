"use client";

// Keeps the drawing layer's store in step with the regions the page holds, and reports what the person
// does on the layer (draw, reshape, select) back as region events. The page's list is the truth: shapes
// go into the layer as "remote" changes, which the layer does not report back, so nothing echoes.
import { Origin, useAnnotator, type AnnotoriousOpenSeadragonAnnotator, type ImageAnnotation } from "@annotorious/react";
import { useEffect, useRef } from "react";
import { boundingBox } from "@/lib/regions/geometry";
import { sameShape, shapeOf, toSelector, type LayerSelector, type RegionShape } from "./region-shapes";

export type AnnotatorRegion = {
  id: number;
  shape: RegionShape;
  /** How it is drawn: the author's work in progress, awaiting review, or vetted. */
  look: "draft" | "proposed" | "vetted";
  /** May the viewer reshape it (their own, in a state that allows editing)? */
  editable: boolean;
};

type Props = {
  imageSize: { width: number; height: number };
  regions: AnnotatorRegion[];
  selectedId: number | null;
  onCreate(shape: RegionShape): void;
  onShapeChange(id: number, shape: RegionShape): void;
  onSelect(id: number | null): void;
};

const annotationOf = (r: AnnotatorRegion): ImageAnnotation =>
  ({ id: String(r.id), bodies: [], target: { annotation: String(r.id), selector: toSelector(r.shape) } }) as unknown as ImageAnnotation;

const selectorOf = (a: ImageAnnotation) => a.target.selector as unknown as LayerSelector;

/** The region id behind a layer annotation; shapes just drawn carry the layer's own (non-numeric) ids. */
const regionId = (a: { id: string } | undefined) => (a && /^-?\d+$/.test(a.id) ? Number(a.id) : null);

export function AnnotationSync({ imageSize, regions, selectedId, onCreate, onShapeChange, onSelect }: Props) {
  const anno = useAnnotator<AnnotoriousOpenSeadragonAnnotator | undefined>();
  const latest = useRef({ imageSize, regions, selectedId, onCreate, onShapeChange, onSelect });
  useEffect(() => {
    latest.current = { imageSize, regions, selectedId, onCreate, onShapeChange, onSelect };
  });

  // The page's regions into the layer: add the new, drop the gone, redraw those whose shape changed
  // elsewhere (an undo, another person's version loaded after a conflict).
  useEffect(() => {
    if (!anno) return;
    const store = anno.state.store;
    const wanted = new Set(regions.map((r) => String(r.id)));
    for (const a of store.all()) {
      if (!wanted.has(a.id)) store.deleteAnnotation(a.id, Origin.REMOTE);
    }
    for (const r of regions) {
      const shown = store.getAnnotation(String(r.id)) as ImageAnnotation | undefined;
      if (!shown) store.addAnnotation(annotationOf(r), Origin.REMOTE);
      else if (!sameShape(shapeOf(selectorOf(shown), imageSize), r.shape, 1)) store.updateAnnotation(annotationOf(r), Origin.REMOTE);
    }
  }, [anno, regions, imageSize]);

  // The page's selection onto the layer; a region newly selected out of sight (from the list, by a key)
  // is brought to the middle of the view, once: later changes to the list must not pull the view back.
  const centred = useRef<number | null>(null);
  useEffect(() => {
    if (!anno) return;
    const current = anno.getSelected().map((a) => regionId(a));
    if (selectedId === null) {
      centred.current = null;
      if (current.length > 0) anno.cancelSelected();
      return;
    }
    const region = latest.current.regions.find((r) => r.id === selectedId);
    if (!region || !anno.state.store.getAnnotation(String(selectedId))) return;
    if (current.length !== 1 || current[0] !== selectedId) anno.setSelected(String(selectedId), region.editable);
    if (centred.current === selectedId) return;
    centred.current = selectedId;
    const { viewport } = anno.viewer;
    const { x, y, w, h } = boundingBox(region.shape);
    const box = viewport.imageToViewportRectangle(x, y, w, h);
    const view = viewport.getBounds(true);
    const inside = box.x >= view.x && box.y >= view.y && box.x + box.width <= view.x + view.width && box.y + box.height <= view.y + view.height;
    if (!inside) viewport.panTo(box.getCenter());
  }, [anno, selectedId, regions]);

  // What the person does on the layer, reported as region events.
  useEffect(() => {
    if (!anno) return;
    const created = (a: ImageAnnotation) => {
      // The drawn shape leaves the layer at once: it comes back as a region when the page makes one.
      anno.state.store.deleteAnnotation(a.id, Origin.REMOTE);
      const shape = shapeOf(selectorOf(a), latest.current.imageSize);
      if (shape) latest.current.onCreate(shape);
    };
    const updated = (a: ImageAnnotation) => {
      const id = regionId(a);
      const shape = shapeOf(selectorOf(a), latest.current.imageSize);
      const before = latest.current.regions.find((r) => r.id === id);
      if (id !== null && shape && before && !sameShape(before.shape, shape)) latest.current.onShapeChange(id, shape);
    };
    // Read the selection when the event arrives (the layer reports a moment later), not from the event:
    // a region replaced under the selection would otherwise report a stale empty selection.
    const selected = () => {
      const id = regionId(anno.getSelected()[0]);
      if (id !== latest.current.selectedId) latest.current.onSelect(id);
    };
    anno.on("createAnnotation", created);
    anno.on("updateAnnotation", updated);
    anno.on("selectionChanged", selected);
    return () => {
      anno.off("createAnnotation", created);
      anno.off("updateAnnotation", updated);
      anno.off("selectionChanged", selected);
    };
  }, [anno]);

  return null;
}
