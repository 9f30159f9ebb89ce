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

describe('cairn commands', () => {
  it('has the batch commands, each with examples in its help', () => {
    const program = buildProgram();
    const names = program.commands.map((c) => c.name());
    expect(names).toEqual(['solve', 'verify', 'bounds', 'formula', 'sweep', 'plan', 'edge-rank', 'convert', 'remote']);
    for (const c of program.commands) {
      let help = '';
      c.configureOutput({ writeOut: (s) => (help += s) });
      c.outputHelp();
      expect(help, c.name()).toMatch(/Examples:\n {2}cairn /);
    }
  });
});
