import { defineConfig } from 'vitest/config';
import { patientTimeouts, sourceConditions } from '../vitest.shared.ts';

// One file at a time: the files share the test database and start real servers.
export default defineConfig({
  ...sourceConditions,
  test: {
    include: ['integration/**/*.test.ts', 'e2e/**/*.test.ts', 'reliability/**/*.test.ts', 'security/**/*.test.ts'],
    globalSetup: ['support/global-setup.ts'],
    fileParallelism: false,
    ...patientTimeouts,
  },
});
