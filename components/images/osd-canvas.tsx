"use client";

// The OpenSeadragon canvas on its own, because OpenSeadragon touches `window` when it loads: the viewer
// imports this file with next/dynamic and ssr: false. It hands the live viewer up and does nothing else.
import OpenSeadragon from "openseadragon";
import { useEffect, useRef } from "react";

type Props = {
  /** The IIIF info.json URL: OpenSeadragon reads the tile pyramid from it. */
  infoUrl: string;
  /** What the canvas is called to assistive technology. */
  label: string;
  /** Id of the element that explains the keyboard commands. */
  describedBy?: string;
  /** More OpenSeadragon options (keep the object stable: a new one rebuilds the viewer). */
  options?: OpenSeadragon.Options;
  onViewer(viewer: OpenSeadragon.Viewer | null): void;
  onOpenFailed(message: string): void;
};

export default function OsdCanvas({ infoUrl, label, describedBy, options, onViewer, onOpenFailed }: Props) {
  const element = useRef<HTMLDivElement>(null);
  // Callbacks change identity on every parent render; the viewer must not be rebuilt for that.
  const handlers = useRef({ onViewer, onOpenFailed });
  useEffect(() => {
    handlers.current = { onViewer, onOpenFailed };
  }, [onViewer, onOpenFailed]);

  useEffect(() => {
    if (!element.current) return;
    const viewer = OpenSeadragon({
      element: element.current,
      tileSources: infoUrl,
      prefixUrl: "/openseadragon/images/",
      // OpenSeadragon's own buttons stay too: they follow the canvas into its full-page mode.
      showNavigationControl: true,
      showRotationControl: true,
      showFullPageControl: true,
      navigationControlAnchor: OpenSeadragon.ControlAnchor.TOP_RIGHT,
      // The overview map tells where one is when far into a painting.
      showNavigator: true,
      navigatorPosition: "BOTTOM_RIGHT",
      // Past one image pixel per screen pixel, up to 4×: enough to count pegs in a soft photograph.
      maxZoomPixelRatio: 4,
      visibilityRatio: 0.5,
      keyboardNavEnabled: true,
      animationTime: 0.6,
      ...options,
    });
    // OpenSeadragon makes its canvas focusable; name it and say how to steer it by keyboard.
    viewer.canvas.setAttribute("role", "application");
    viewer.canvas.setAttribute("aria-roledescription", "zoomable photograph");
    viewer.canvas.setAttribute("aria-label", label);
    if (describedBy) viewer.canvas.setAttribute("aria-describedby", describedBy);
    // OpenSeadragon focuses its canvas on every click; a plain focus() scrolls a canvas that sticks out
    // of the window into view, which moves the page under the pointer halfway through a polygon.
    const focusCanvas = viewer.canvas.focus.bind(viewer.canvas);
    viewer.canvas.focus = (opts?: FocusOptions) => focusCanvas({ ...opts, preventScroll: true });
    // The frame clips outside outlines: draw the keyboard focus ring inside the canvas.
    viewer.canvas.style.outlineOffset = "-4px";
    viewer.addHandler("open", () => handlers.current.onViewer(viewer));
    viewer.addHandler("open-failed", (e) => handlers.current.onOpenFailed(e.message || "the image information could not be read"));
    return () => {
      handlers.current.onViewer(null);
      viewer.destroy();
    };
  }, [infoUrl, label, describedBy, options]);

  return <div ref={element} className="h-full w-full" data-testid="osd-canvas" />;
}
