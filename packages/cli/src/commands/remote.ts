import { writeFileSync } from 'node:fs';
import { Command, Option } from 'commander';
import { AtlasList, MeResponse, RunView, type RunSummary } from '@cairn/schema';
import { CliError, EXIT } from '../cli-error';
import { RemoteClient } from '../remote/remote-client';
import { remoteConfigPath, resolveRemote, writeRemoteConfig, type RemoteFlags } from '../remote/remote-config';

const finished = new Set(['done', 'failed', 'cancelled']);

function withRemoteFlags(cmd: Command): Command {
  return cmd
    .option('--server <url>', 'the Cairn server (else CAIRN_SERVER, else the saved login)')
    .option('--key <secret>', 'an API key, cairn_... (else CAIRN_API_KEY, else the saved login)');
}

/** One line per run: what it is, where it stands, and its value or bounds. */
export function describeRun(run: RunSummary): string {
  const value =
    run.rankNumber !== null ? `rank number ${run.rankNumber} (${run.provenance})` : run.lower !== null && run.upper !== null ? `${run.lower} <= rank number <= ${run.upper}` : '';
  const why = run.error ? `: ${run.error.message}` : '';
  return `${run.id}  ${run.specText}  ${run.status}${why}${value ? `  ${value}` : ''}`;
}

function exitFor(run: RunSummary): number {
  if (run.status === 'failed') return EXIT.negative;
  if (run.status === 'cancelled' || run.rankNumber === null) return EXIT.limitReached;
  return EXIT.ok;
}

/** Polls until the run ends; progress goes to stderr when it is a terminal. */
async function waitFor(client: RemoteClient, id: string, quiet: boolean): Promise<RunSummary> {
  const started = Date.now();
  for (;;) {
    const run = await client.json(`/api/v1/runs/${id}`, RunView);
    if (finished.has(run.status)) {
      if (!quiet && process.stderr.isTTY) process.stderr.write('\n');
      return run;
    }
    if (!quiet && process.stderr.isTTY) {
      const p = run.progress;
      const interval = p ? `  [${p.lower}, ${p.upper}]  ${p.nodes} nodes` : '';
      process.stderr.write(`\r${run.status}  ${((Date.now() - started) / 1000).toFixed(0)} s${interval}   `);
    }
    await new Promise((r) => setTimeout(r, 500));
  }
}

export function remoteCommand(program: Command): void {
  const remote = program
    .command('remote')
    .description('work with a Cairn server through its API: submit runs, follow them, pull results, read the atlas')
    .addHelpText(
      'after',
      '\nThe server and API key come from --server/--key, else CAIRN_SERVER/CAIRN_API_KEY, else the file that\n' +
        '`cairn remote login` writes (mode 600) in your config directory.\n\nExamples:\n' +
        '  cairn remote login --server http://127.0.0.1:4780 --key cairn_...\n  cairn remote submit grid:4x7 --wait\n' +
        '  cairn remote status <run id>\n  cairn remote pull <run id> --format svg --out grid.svg\n  cairn remote atlas --family grid --rows 4',
    );

  withRemoteFlags(remote.command('login'))
    .description('check a server and key, and save them for the other remote commands')
    .action(async (flags: RemoteFlags) => {
      if (!flags.server || !flags.key) throw new CliError('cairn remote login needs both --server and --key');
      const config = resolveRemote(flags);
      const me = await new RemoteClient(config).json('/api/v1/me', MeResponse);
      if (!me.user) throw new CliError('the server did not accept the key as a member');
      writeRemoteConfig(config);
      process.stdout.write(`signed in to ${config.server} as ${me.user.login} (${me.user.role}; scopes ${me.permissions.join(', ')})\n`);
      process.stderr.write(`saved to ${remoteConfigPath()}\n`);
    });

  withRemoteFlags(remote.command('submit'))
    .description('start a run on the server; prints its id (or, with --wait, its result)')
    .argument('<spec>', 'a graph spec such as grid:4x7, staircase:6, path:100')
    .addOption(new Option('--method <method>', 'how to reach the value').choices(['auto', 'exact', 'bounds', 'formula']).default('auto'))
    .option('--time-limit <seconds>', 'stop the search after this many seconds', (v) => {
      const n = Number(v);
      if (!Number.isInteger(n) || n < 1) throw new CliError(`--time-limit takes a whole number of seconds, got '${v}'`);
      return n;
    })
    .option('--wait', 'wait for the run to end and print its result')
    .option('--json', 'print the run as JSON')
    .option('-q, --quiet', 'no progress on stderr')
    .action(async (spec: string, flags: RemoteFlags & { method: string; timeLimit?: number; wait?: boolean; json?: boolean; quiet?: boolean }) => {
      const client = new RemoteClient(resolveRemote(flags));
      let run: RunSummary = await client.post('/api/v1/runs', { spec, method: flags.method, ...(flags.timeLimit ? { timeLimitSeconds: flags.timeLimit } : {}) }, RunView);
      if (flags.wait) run = await waitFor(client, run.id, Boolean(flags.quiet));
      process.stdout.write(flags.json ? `${JSON.stringify(flags.wait ? await client.json(`/api/v1/runs/${run.id}`, RunView) : run)}\n` : `${describeRun(run)}\n`);
      if (flags.wait) process.exitCode = exitFor(run);
    });

  withRemoteFlags(remote.command('status'))
    .description('where a run stands: its status, value or bounds')
    .argument('<id>', 'the run id')
    .option('--wait', 'wait for the run to end')
    .option('--json', 'print the run as JSON')
    .option('-q, --quiet', 'no progress on stderr')
    .action(async (id: string, flags: RemoteFlags & { wait?: boolean; json?: boolean; quiet?: boolean }) => {
      const client = new RemoteClient(resolveRemote(flags));
      const run = flags.wait ? await waitFor(client, id, Boolean(flags.quiet)) : await client.json(`/api/v1/runs/${encodeURIComponent(id)}`, RunView);
      process.stdout.write(flags.json ? `${JSON.stringify(run)}\n` : `${describeRun(run)}\n`);
      if (finished.has(run.status)) process.exitCode = exitFor(run);
    });

  withRemoteFlags(remote.command('pull'))
    .description("download a finished run's result: JSON, the labels as CSV, or a picture (SVG, TikZ)")
    .argument('<id>', 'the run id')
    .addOption(new Option('--format <format>', 'what to download').choices(['json', 'csv', 'svg', 'tikz']).default('json'))
    .option('-o, --out <file>', 'write to a file instead of stdout')
    .action(async (id: string, flags: RemoteFlags & { format: string; out?: string }) => {
      const client = new RemoteClient(resolveRemote(flags));
      const res = await client.request(`/api/v1/runs/${encodeURIComponent(id)}/export?format=${flags.format}`, { headers: { accept: '*/*' } });
      const text = await res.text();
      if (flags.out) {
        writeFileSync(flags.out, text);
        process.stderr.write(`wrote ${flags.out}\n`);
      } else process.stdout.write(text.endsWith('\n') ? text : `${text}\n`);
    });

  withRemoteFlags(remote.command('atlas'))
    .description("read the server's atlas: the best known value or bounds of each graph, with provenance")
    .option('--family <family>', 'only this family (grid, cylinder, torus, staircase, ...)')
    .option('--rows <n>', 'only this many rows')
    .option('--cols <n>', 'only this many columns')
    .option('--exact', 'only exact values')
    .option('--limit <n>', 'at most this many rows (1..100)', '100')
    .option('--json', 'print the entries as JSON')
    .action(async (flags: RemoteFlags & { family?: string; rows?: string; cols?: string; exact?: boolean; limit: string; json?: boolean }) => {
      const client = new RemoteClient(resolveRemote(flags));
      const query = new URLSearchParams({ limit: flags.limit });
      if (flags.family) query.set('family', flags.family);
      if (flags.rows) query.set('rows', flags.rows);
      if (flags.cols) query.set('cols', flags.cols);
      if (flags.exact) query.set('exact', 'true');
      const list = await client.json(`/api/v1/atlas?${query}`, AtlasList);
      if (flags.json) {
        process.stdout.write(`${JSON.stringify(list)}\n`);
        return;
      }
      if (list.entries.length === 0) process.stderr.write('no atlas entries match\n');
      for (const e of list.entries) {
        const value = e.exact ? `${e.lower}` : `[${e.lower}, ${e.upper}]`;
        process.stdout.write(`${e.graphKey}\t${value}\t${e.exact ? 'exact' : 'bounds'}\n`);
      }
      if (list.total > list.entries.length) process.stderr.write(`${list.entries.length} of ${list.total} shown; narrow with --family/--rows/--cols\n`);
    });
}
