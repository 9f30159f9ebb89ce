// Shared vitest settings: workspace packages resolve to their TypeScript sources through the
// custom "source" export condition, so unit tests never need a build first.
import { defaultClientConditions, defaultServerConditions } from 'vite';
import type { ViteUserConfig } from 'vitest/config';

export const sourceConditions = {
  resolve: { conditions: ['source', ...defaultClientConditions] },
  ssr: { resolve: { conditions: ['source', ...defaultServerConditions] } },
} satisfies ViteUserConfig;

/**
 * Time a test and a hook may take before vitest fails it: a minute, not vitest's 5 s. Tests never assert
 * wall-clock times, and on a busy 2-core machine (PostgreSQL, Chromium and the other suites on the same
 * cores) a CPU-heavy case can take several times its usual few seconds; a test that hangs still fails.
 */
export const patientTimeouts = { testTimeout: 60_000, hookTimeout: 60_000 };
