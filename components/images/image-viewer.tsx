"use client";

// The deep-zoom viewer of one photograph with its evidence: OpenSeadragon over the IIIF image service
// and the regions drawn over it, our toolbar (and the drawing tools for those who may mark regions),
// the regions panel and the photograph's details beside it, and the source's other photographs below.
import dynamic from "next/dynamic";
import { useId, useState } from "react";
import { DrawingTools } from "@/components/regions/drawing-tools";
import { RegionPanel } from "@/components/regions/region-panel";
import { ShortcutHelp } from "@/components/regions/shortcut-help";
import { useRegionShortcuts } from "@/components/regions/use-region-shortcuts";
import { useRegionWorkspace } from "@/components/regions/use-region-workspace";
import { Notice } from "@/components/ui/notice";
import { ImageDetails } from "./image-details";
import { ImageStrip, type StripImage } from "./image-thumbnails";
import { imageName, infoJsonUrl, type SourceImage } from "./image-types";
import { useViewerControls } from "./use-viewer-controls";
import { ViewerToolbar } from "./viewer-toolbar";

const RegionAnnotator = dynamic(() => import("@/components/regions/region-annotator"), {
  ssr: false,
  loading: () => <p className="p-6 text-sm text-ink-faint">Loading the viewer…</p>,
});

type Props = {
  image: SourceImage;
  sourceTitle: string;
  others: StripImage[];
  /** May the viewer mark regions (a contributor or above)? */
  canDraw: boolean;
  /** The signed-in person's user id (their own regions are marked as theirs), or null. */
  viewerId: number | null;
  /** May the viewer ask for proposed, not yet reviewed, evidence (signed-in readers and above)? */
  canSeeProposed: boolean;
  /** A region to select on arrival (links in notifications name one). */
  initialRegionId?: number | null;
};

export function ImageViewer({ image, sourceTitle, others, canDraw, viewerId, canSeeProposed, initialRegionId = null }: Props) {
  const hintId = useId();
  const controls = useViewerControls();
  const [failed, setFailed] = useState<string | null>(null);
  const workspace = useRegionWorkspace({
    imageId: image.id,
    canDraw,
    initialRegionId,
    rotate: (by) => controls.command(by < 0 ? "rotate-left" : "rotate-right"),
  });
  useRegionShortcuts(canDraw, workspace.run);

  const name = imageName(image);
  const { fullScreen } = controls;
  return (
    <div className="grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-[minmax(0,1fr)_24rem]">
      <div>
        <div ref={controls.frame} className={`flex flex-col overflow-hidden rounded border border-rule bg-card ${fullScreen ? "h-screen" : ""}`}>
          <ViewerToolbar enabled={controls.viewer !== null} zoomPercent={controls.zoom} rotation={controls.rotation} fullScreen={fullScreen} onCommand={controls.command} />
          {canDraw && <DrawingTools tool={workspace.tool} enabled={controls.viewer !== null} onTool={workspace.setTool} />}
          <div className={`relative bg-ink ${fullScreen ? "flex-1" : "h-[70vh] min-h-80"}`}>
            {failed ? (
              <div className="p-6">
                <Notice tone="warn">The photograph could not be opened: {failed}. Reload the page to try again.</Notice>
              </div>
            ) : (
              <RegionAnnotator
                infoUrl={infoJsonUrl(image.id)}
                imageSize={{ width: image.width ?? 1, height: image.height ?? 1 }}
                label={`${name}, from “${sourceTitle}”`}
                describedBy={hintId}
                regions={workspace.onImage}
                selectedId={workspace.selectedId}
                tool={canDraw ? workspace.tool : "select"}
                onViewer={controls.setViewer}
                onOpenFailed={setFailed}
                onCreate={workspace.onCreate}
                onShapeChange={workspace.onShapeChange}
                onSelect={workspace.select}
              />
            )}
          </div>
        </div>
        <ShortcutHelp id={hintId} canDraw={canDraw} />
      </div>
      <div className="grid content-start gap-6">
        <RegionPanel imageId={image.id} sourceId={image.sourceId} workspace={workspace} canDraw={canDraw} canSeeProposed={canSeeProposed} viewerId={viewerId} />
        <ImageDetails image={image} />
      </div>
      {others.length > 1 && (
        <div className="lg:col-span-2">
          <ImageStrip images={others} current={image.id} />
        </div>
      )}
    </div>
  );
}
