import react from '@vitejs/plugin-react';
import { defineConfig } from 'vitest/config';
import { patientTimeouts, sourceConditions } from '../../vitest.shared.ts';

export default defineConfig({
  ...sourceConditions,
  plugins: [react()],
  test: { include: ['test/**/*.test.tsx', 'test/**/*.test.ts'], environment: 'jsdom', ...patientTimeouts },
});
