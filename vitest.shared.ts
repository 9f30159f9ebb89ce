// Shared vitest settings: workspace packages resolve to their TypeScript sources through the
// custom "source" export condition, so unit tests never need a build first.
import { defaultClientConditions, defaultServerConditions } from 'vite';
import type { ViteUserConfig } from 'vitest/config';

export const sourceConditions = {
  resolve: { conditions: ['source', ...defaultClientConditions] },
  ssr: { resolve: { conditions: ['source', ...defaultServerConditions] } },
} satisfies ViteUserConfig;
