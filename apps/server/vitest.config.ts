import { defineConfig } from 'vitest/config';
import { patientTimeouts, sourceConditions } from '../../vitest.shared.ts';

export default defineConfig({ ...sourceConditions, test: { include: ['test/**/*.test.ts'], ...patientTimeouts } });
