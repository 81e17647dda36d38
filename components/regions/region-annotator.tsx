"use client";

// The photograph with its regions drawn over it: OpenSeadragon (our OsdCanvas) with the Annotorious
// drawing layer on top. Loaded with next/dynamic and ssr: false, since both touch `window` on import.
//
// How drawing is switched on: the layer draws only with `drawingEnabled`, and its `drawingMode`
// decides how a shape starts. In "drag" mode the layer turns OpenSeadragon's mouse navigation off
// while no shape is selected, so a press-and-drag draws a rectangle instead of panning the photograph
// (the layer's default on a desktop is "click": a click starts the rectangle and a second click ends
// it, and a drag pans, which is what an earlier try ran into). Polygons are drawn in "click" mode:
// each click adds a corner, a drag between clicks still pans, and clicking the first point (or a
// double-click) closes the shape. With the Select/move tool drawing is off: a drag pans, a click
// selects, and a selected region of one's own can be moved and reshaped with its handles.
import "@annotorious/react/annotorious-react.css";
import { Annotorious, OpenSeadragonAnnotator, OpenSeadragonAnnotatorContext, UserSelectAction, type DrawingStyle, type ImageAnnotation } from "@annotorious/react";
import type OpenSeadragon from "openseadragon";
import { useCallback, useContext, useMemo, useRef } from "react";
import OsdCanvas from "@/components/images/osd-canvas";
import type { RegionShape } from "./region-shapes";
import type { RegionTool } from "./region-tools";
import { AnnotationSync, type AnnotatorRegion } from "./annotation-sync";

export type { AnnotatorRegion };

export type RegionAnnotatorProps = {
  /** The IIIF info.json of the photograph. */
  infoUrl: string;
  /** The photograph's full size in pixels: shapes are clipped to it. */
  imageSize: { width: number; height: number };
  label: string;
  describedBy?: string;
  /** Every region to show, in full-image pixel coordinates. */
  regions: AnnotatorRegion[];
  selectedId: number | null;
  tool: RegionTool;
  onViewer(viewer: OpenSeadragon.Viewer | null): void;
  onOpenFailed(message: string): void;
  /** A shape was drawn; the parent decides whether it becomes a region. */
  onCreate(shape: RegionShape): void;
  /** A region's outline was moved or reshaped. */
  onShapeChange(id: number, shape: RegionShape): void;
  onSelect(id: number | null): void;
};

// Colours of the theme (app/globals.css), as the drawing layer wants them: hex strings.
const LOOKS: Record<AnnotatorRegion["look"], { stroke: `#${string}`; fill: `#${string}` }> = {
  vetted: { stroke: "#1d5a43", fill: "#e3efe8" },
  proposed: { stroke: "#b8321a", fill: "#fbe9e4" },
  draft: { stroke: "#fffdf8", fill: "#1f1a14" },
};

export default function RegionAnnotator(props: RegionAnnotatorProps) {
  const { tool, regions } = props;
  // The layer keeps the first style and select-action functions it is given, so they read the
  // regions through a ref rather than closing over one render's list.
  const byId = useRef(new Map<string, AnnotatorRegion>());
  byId.current = new Map(regions.map((r) => [String(r.id), r]));

  const style = useCallback((a: ImageAnnotation, state?: { selected?: boolean; hovered?: boolean }): DrawingStyle => {
    const look = LOOKS[byId.current.get(a.id)?.look ?? "draft"];
    const strong = state?.selected || state?.hovered;
    return { stroke: look.stroke, strokeWidth: strong ? 3 : 2, strokeOpacity: 1, fill: look.fill, fillOpacity: strong ? 0.25 : 0.12 };
  }, []);
  // Only one's own regions can be reshaped; the others can be selected to read them.
  const selectAction = useCallback((a: ImageAnnotation) => (byId.current.get(a.id)?.editable ? UserSelectAction.EDIT : UserSelectAction.SELECT), []);

  return (
    <Annotorious>
      <OpenSeadragonAnnotator
        drawingEnabled={tool !== "select"}
        drawingMode={tool === "rectangle" ? "drag" : "click"}
        tool={tool === "polygon" ? "polygon" : "rectangle"}
        autoSave
        userSelectAction={selectAction}
        style={style}
      >
        <ViewerMount {...props} />
        <AnnotationSync {...props} />
      </OpenSeadragonAnnotator>
    </Annotorious>
  );
}

// The photograph is a click target for selecting, so a click must not zoom (OpenSeadragon's default);
// the wheel, the keys and the toolbar zoom.
const GESTURES: OpenSeadragon.Options = { gestureSettingsMouse: { clickToZoom: false, dblClickToZoom: false }, gestureSettingsPen: { clickToZoom: false } };

/** Builds the viewer and hands it both to the drawing layer (through its context) and to the page. */
function ViewerMount({ infoUrl, label, describedBy, onViewer, onOpenFailed }: RegionAnnotatorProps) {
  const { setViewer } = useContext(OpenSeadragonAnnotatorContext);
  const handed = useMemo(
    () => (viewer: OpenSeadragon.Viewer | null) => {
      if (viewer) {
        // Never mirror: a mirrored photograph swaps the player's hands, and the shapes would not follow.
        viewer.addHandler("canvas-key", (e) => {
          if ((e.originalEvent as KeyboardEvent).code === "KeyF") e.preventDefaultAction = true;
        });
      }
      setViewer(viewer as OpenSeadragon.Viewer);
      onViewer(viewer);
    },
    [setViewer, onViewer],
  );
  return <OsdCanvas infoUrl={infoUrl} label={label} describedBy={describedBy} options={GESTURES} onViewer={handed} onOpenFailed={onOpenFailed} />;
}
