"use client";

// The viewer's readouts and commands, apart from how the canvas is drawn: zoom and rotation read back
// from the viewport whoever moved it (buttons, keys, wheel or pinch), and full screen for the frame.
import type OpenSeadragon from "openseadragon";
import { useCallback, useEffect, useRef, useState } from "react";
import type { ViewerCommand } from "./viewer-toolbar";

export function useViewerControls() {
  const frame = useRef<HTMLDivElement>(null);
  const [viewer, setViewer] = useState<OpenSeadragon.Viewer | null>(null);
  const [zoom, setZoom] = useState<number | null>(null);
  const [rotation, setRotation] = useState(0);
  const [fullScreen, setFullScreen] = useState(false);

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

  return { frame, viewer, setViewer, zoom, rotation, fullScreen, command };
}
