import type { ExactProgress } from '@cairn/engine/pool';

/** A one-line progress display on stderr, only when stderr is a terminal and not --quiet. */
export function progressLine(quiet: boolean): { update(p: ExactProgress): void; done(): void } {
  const active = !quiet && process.stderr.isTTY === true;
  let shown = false;
  return {
    update(p) {
      if (!active) return;
      shown = true;
      process.stderr.write(`\r\x1b[K[${p.lower}, ${p.upper}]  ${p.nodes} nodes  memo ${p.memoSize}  ${(p.elapsedMs / 1000).toFixed(1)} s`);
    },
    done() {
      if (shown) process.stderr.write('\r\x1b[K');
    },
  };
}
