/** What the bench page (main.tsx) offers the Node side through `globalThis.pictureBench`. */

/** One grid and its verified ranking, as the page draws it. */
export interface PictureCase {
  rows: number;
  cols: number;
  /** labels[v], 1-based, in the engine's row-major vertex numbering. */
  labels: number[];
  /** parent[v] in the ranking's elimination forest (-1 for a root). */
  parents: number[];
}

/** A fresh mount, timed from just before `root.render` (as the app mounts it). */
export interface MountTiming {
  renderer: 'svg' | 'canvas';
  /** To the animation-frame callback of the first frame that contains the drawn picture. */
  toFrameMs: number;
  /** To the first task after that frame's main-thread rendering (style, layout, paint): the picture is on its way to the screen. */
  toPaintedMs: number;
  /** Animation frames that went by before the picture was there. */
  frames: number;
}

/** A mount inside `flushSync`: React's render, commit and the canvas's drawing effect, all synchronous. */
export interface SyncMountTiming {
  renderer: 'svg' | 'canvas';
  syncMs: number;
  /** Whether the picture was complete when flushSync returned (so syncMs includes the drawing). */
  completeOnReturn: boolean;
}

/** What the canvas holds after a mount: its size and the colour at the centre of each vertex's cell. */
export interface DrawnCanvas {
  width: number;
  height: number;
  /** Pixels per cell side. */
  cellPx: number;
  /** [r, g, b, a] at the centre of vertex v's cell, flattened: 4 entries per vertex. */
  centres: number[];
}

export interface PictureBench {
  setCase(c: PictureCase): void;
  /** Unmounts any picture, mounts a fresh one and resolves once its frame is painted. */
  mount(): Promise<MountTiming>;
  mountSync(): SyncMountTiming;
  /**
   * Hovers vertex `v` of the mounted picture (a synthetic mousemove on the canvas, mouseover on the
   * SVG cell) and times until the cell `probe` (an ancestor of v) is drawn highlighted and painted.
   */
  hover(v: number, probe: number): Promise<MountTiming>;
  readCanvas(): DrawnCanvas;
  /** The SVG's cells in document order: [data-vertex, data-label] of each. */
  readSvgCells(): [number, number][];
  unmount(): void;
}

/** How the Node side reaches the page's API inside `page.evaluate`. */
export type BenchGlobal = { pictureBench: PictureBench };
