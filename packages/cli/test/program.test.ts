import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildProgram } from '../src/index';

const pkg = JSON.parse(readFileSync(new URL('../package.json', import.meta.url), 'utf8')) as { version: string };

describe('cairn', () => {
  it('prints its version from package.json', async () => {
    let out = '';
    const program = buildProgram().exitOverride().configureOutput({ writeOut: (s) => (out += s) });
    await expect(program.parseAsync(['node', 'cairn', '--version'])).rejects.toMatchObject({ code: 'commander.version' });
    expect(out.trim()).toBe(pkg.version);
  });
});
