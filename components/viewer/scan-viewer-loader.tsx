"use client";

import dynamic from "next/dynamic";

/** The WebGL viewer, loaded in the browser only (three.js needs a canvas). */
export const ScanViewerLoader = dynamic(() => import("./scan-viewer").then((m) => m.ScanViewer), {
  ssr: false,
  loading: () => <div className="grid h-full place-items-center text-sm text-kraft-700">Loading the 3D viewer…</div>,
});
