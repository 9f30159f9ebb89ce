#!/usr/bin/env node
// The installed command runs the built CLI; `pnpm --filter @cairn/cli build` makes dist/.
import '../dist/cli.js';
