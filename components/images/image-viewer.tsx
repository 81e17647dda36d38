"use client";

// The deep-zoom viewer of one photograph: OpenSeadragon over the IIIF image service, our toolbar,
// the photograph's details beside it and the source's other photographs below.
import dynamic from "next/dynamic";
import type OpenSeadragon from "openseadragon";
import { useCallback, useEffect, useId, useRef, useState } from "react";
import { Notice } from "@/components/ui/notice";
import { ImageDetails } from "./image-details";
import { ImageStrip, type StripImage } from "./image-thumbnails";
import { imageName, infoJsonUrl, type SourceImage } from "./image-types";
import { ViewerToolbar, type ViewerCommand } from "./viewer-toolbar";

const OsdCanvas = dynamic(() => import("./osd-canvas"), {
  ssr: false,
  loading: () => <p className="p-6 text-sm text-ink-faint">Loading the viewer…</p>,
});

type Props = { image: SourceImage; sourceTitle: string; others: StripImage[] };

export function ImageViewer({ image, sourceTitle, others }: Props) {
  const hintId = useId();
  const frame = useRef<HTMLDivElement>(null);
  const [viewer, setViewer] = useState<OpenSeadragon.Viewer | null>(null);
  const [zoom, setZoom] = useState<number | null>(null);
  const [rotation, setRotation] = useState(0);
  const [fullScreen, setFullScreen] = useState(false);
  const [failed, setFailed] = useState<string | null>(null);

  // Read the numbers back from the viewport, whoever moved it (buttons, keys, wheel or pinch).
  useEffect(() => {
    if (!viewer) return;
    const read = () => {
      const { viewport } = viewer;
      setZoom(viewport.viewportToImageZoom(viewport.getZoom(true)) * 100);
      setRotation(viewport.getRotation(true));
    };
    const events = ["animation", "animation-finish", "rotate", "resize", "zoom"] as const;
    events.forEach((e) => viewer.addHandler(e, read));
    read();
    return () => events.forEach((e) => viewer.removeHandler(e, read));
  }, [viewer]);

  useEffect(() => {
    const follow = () => setFullScreen(document.fullscreenElement === frame.current);
    document.addEventListener("fullscreenchange", follow);
    return () => document.removeEventListener("fullscreenchange", follow);
  }, []);

  const command = useCallback(
    (c: ViewerCommand) => {
      if (!viewer) return;
      const { viewport } = viewer;
      if (c === "zoom-in") viewport.zoomBy(2);
      else if (c === "zoom-out") viewport.zoomBy(0.5);
      else if (c === "rotate-left") viewport.setRotation(viewport.getRotation() - 90);
      else if (c === "rotate-right") viewport.setRotation(viewport.getRotation() + 90);
      else if (c === "reset") {
        viewport.setRotation(0);
        viewport.goHome();
      } else if (c === "full-screen") {
        // Our frame goes full screen, toolbar and all; without the Fullscreen API, OpenSeadragon's full page.
        if (document.fullscreenElement) void document.exitFullscreen();
        else if (frame.current?.requestFullscreen) void frame.current.requestFullscreen().catch(() => viewer.setFullPage(true));
        else viewer.setFullPage(true);
      }
      viewport.applyConstraints();
    },
    [viewer],
  );

  const name = imageName(image);
  return (
    <div className="grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-[minmax(0,1fr)_18rem]">
      <div>
        <div ref={frame} className={`flex flex-col overflow-hidden rounded border border-rule bg-card ${fullScreen ? "h-screen" : ""}`}>
          <ViewerToolbar enabled={viewer !== null} zoomPercent={zoom} rotation={rotation} fullScreen={fullScreen} onCommand={command} />
          <div className={`relative bg-ink ${fullScreen ? "flex-1" : "h-[70vh] min-h-80"}`}>
            {failed ? (
              <div className="p-6">
                <Notice tone="warn">The photograph could not be opened: {failed}. Reload the page to try again.</Notice>
              </div>
            ) : (
              <OsdCanvas infoUrl={infoJsonUrl(image.id)} label={`${name}, from “${sourceTitle}”`} describedBy={hintId} onViewer={setViewer} onOpenFailed={setFailed} />
            )}
          </div>
        </div>
        <p id={hintId} className="mt-2 text-sm text-ink-faint">
          Keyboard: click the photograph or move to it with Tab, then <kbd className="font-mono">+</kbd> and <kbd className="font-mono">−</kbd> zoom,
          the arrow keys move, <kbd className="font-mono">R</kbd> and <kbd className="font-mono">Shift R</kbd> rotate, <kbd className="font-mono">0</kbd> goes
          back to the whole picture. The mouse wheel zooms too.
        </p>
      </div>
      <ImageDetails image={image} />
      {others.length > 1 && (
        <div className="lg:col-span-2">
          <ImageStrip images={others} current={image.id} />
        </div>
      )}
    </div>
  );
}
