// The bench page: the web app's real RankingPicture on a grid with a ranking computed by the engine
// (handed over by the Node side), mounted and hovered under timing. Nothing here re-implements drawing.
import { flushSync } from 'react-dom';
import { createRoot, type Root } from 'react-dom/client';
import { gridLayout, RankingPicture, SVG_CELL_LIMIT } from '@cairn/web/ranking-picture';
import type { BenchGlobal, DrawnCanvas, MountTiming, PictureBench, PictureCase, SyncMountTiming } from './protocol';
import './picture.css';

const OCHRE = [0xc9, 0x8a, 0x3a] as const; // the component's highlight for cells above the hovered one
const TIMEOUT_MS = 20_000;

let current: PictureCase | null = null;
let mounted: { root: Root; host: HTMLElement } | null = null;

const stage = () => document.getElementById('stage')!;
const isCanvas = (c: PictureCase) => c.rows * c.cols > SVG_CELL_LIMIT;
const canvas = () => mounted?.host.querySelector<HTMLCanvasElement>('[data-testid="ranking-canvas"]') ?? null;

function requireCase(): PictureCase {
  if (!current) throw new Error('setCase first');
  return current;
}

function element(c: PictureCase) {
  return <RankingPicture layout={gridLayout(c.rows, c.cols)} labels={c.labels} forestParents={c.parents} title={`${c.rows} x ${c.cols} grid`} />;
}

function freshRoot(): { root: Root; host: HTMLElement } {
  unmount();
  const host = document.createElement('div');
  stage().append(host);
  return { root: createRoot(host), host };
}

function unmount() {
  if (!mounted) return;
  mounted.root.unmount();
  mounted.host.remove();
  mounted = null;
}

/** The RGBA of vertex v's cell centre; the cell size is the canvas width over the columns. */
function cellPixel(cv: HTMLCanvasElement, c: PictureCase, v: number): Uint8ClampedArray {
  const cellPx = cv.width / c.cols;
  const x = (v % c.cols) * cellPx + (cellPx >> 1);
  const y = Math.floor(v / c.cols) * cellPx + (cellPx >> 1);
  return cv.getContext('2d')!.getImageData(x, y, 1, 1).data;
}

/** The canvas draws every cell in one effect, last cell last: once that one is opaque, all are drawn. */
function complete(c: PictureCase): boolean {
  if (!isCanvas(c)) return (mounted?.host.querySelectorAll('[data-vertex]').length ?? 0) === c.rows * c.cols;
  const cv = canvas();
  return cv !== null && cellPixel(cv, c, c.rows * c.cols - 1)[3] === 255;
}

function highlighted(c: PictureCase, probe: number): boolean {
  if (!isCanvas(c)) return mounted?.host.querySelector(`[data-vertex="${probe}"]`)?.hasAttribute('data-above') ?? false;
  const cv = canvas();
  if (!cv) return false;
  const px = cellPixel(cv, c, probe);
  return px[0] === OCHRE[0] && px[1] === OCHRE[1] && px[2] === OCHRE[2];
}

/**
 * Resolves once `done()` holds in an animation-frame callback (that frame is the first to contain the
 * change), then waits for the first task after the frame's rendering steps: a message posted from the
 * callback runs after the main thread has styled, laid out and painted that frame.
 */
function untilPainted(startedAt: number, done: () => boolean): Promise<MountTiming> {
  const renderer = isCanvas(requireCase()) ? 'canvas' : 'svg';
  return new Promise((resolve, reject) => {
    let frames = 0;
    const onFrame = () => {
      frames++;
      if (!done()) {
        if (performance.now() - startedAt > TIMEOUT_MS) reject(new Error(`not drawn after ${TIMEOUT_MS} ms`));
        else requestAnimationFrame(onFrame);
        return;
      }
      const toFrameMs = performance.now() - startedAt;
      const channel = new MessageChannel();
      channel.port1.onmessage = () => {
        channel.port1.close();
        resolve({ renderer, toFrameMs, toPaintedMs: performance.now() - startedAt, frames });
      };
      channel.port2.postMessage(null);
    };
    requestAnimationFrame(onFrame);
  });
}

const bench: PictureBench = {
  setCase(c) {
    unmount();
    current = c;
  },
  mount() {
    const c = requireCase();
    const fresh = freshRoot();
    const startedAt = performance.now();
    fresh.root.render(element(c));
    mounted = fresh;
    return untilPainted(startedAt, () => complete(c));
  },
  mountSync(): SyncMountTiming {
    const c = requireCase();
    const fresh = freshRoot();
    mounted = fresh;
    const startedAt = performance.now();
    flushSync(() => fresh.root.render(element(c)));
    const syncMs = performance.now() - startedAt;
    return { renderer: isCanvas(c) ? 'canvas' : 'svg', syncMs, completeOnReturn: complete(c) };
  },
  hover(v, probe) {
    const c = requireCase();
    if (!mounted) throw new Error('mount first');
    const startedAt = performance.now();
    if (isCanvas(c)) {
      const cv = canvas()!;
      const box = cv.getBoundingClientRect();
      const clientX = box.left + ((v % c.cols) + 0.5) * (box.width / c.cols);
      const clientY = box.top + (Math.floor(v / c.cols) + 0.5) * (box.height / c.rows);
      cv.dispatchEvent(new MouseEvent('mousemove', { bubbles: true, clientX, clientY }));
    } else {
      // relatedTarget null: entering from outside the window, so React fires onMouseEnter on the cell.
      mounted.host.querySelector(`[data-vertex="${v}"]`)!.dispatchEvent(new MouseEvent('mouseover', { bubbles: true, relatedTarget: null }));
    }
    return untilPainted(startedAt, () => highlighted(c, probe));
  },
  readCanvas(): DrawnCanvas {
    const c = requireCase();
    const cv = canvas();
    if (!cv) throw new Error('no canvas mounted');
    const cellPx = cv.width / c.cols;
    const all = cv.getContext('2d')!.getImageData(0, 0, cv.width, cv.height).data;
    const centres: number[] = [];
    for (let v = 0; v < c.rows * c.cols; v++) {
      const x = (v % c.cols) * cellPx + (cellPx >> 1);
      const y = Math.floor(v / c.cols) * cellPx + (cellPx >> 1);
      const at = (y * cv.width + x) * 4;
      centres.push(all[at]!, all[at + 1]!, all[at + 2]!, all[at + 3]!);
    }
    return { width: cv.width, height: cv.height, cellPx, centres };
  },
  readSvgCells() {
    const cells = mounted?.host.querySelectorAll('[data-testid="ranking-picture"] [data-vertex]') ?? [];
    return Array.from(cells, (g): [number, number] => [Number(g.getAttribute('data-vertex')), Number(g.getAttribute('data-label'))]);
  },
  unmount,
};

(globalThis as unknown as BenchGlobal).pictureBench = bench;
document.body.dataset.ready = '';
