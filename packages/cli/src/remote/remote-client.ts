import { ApiError } from '@cairn/schema';
import type { z } from 'zod';
import { CliError, EXIT } from '../cli-error';
import type { RemoteConfig } from './remote-config';

/** Calls the Cairn API with the API key; a refusal or an unreachable server becomes one clear line. */
export class RemoteClient {
  constructor(readonly config: RemoteConfig) {}

  async request(path: string, init: RequestInit = {}): Promise<Response> {
    const url = `${this.config.server}${path}`;
    let res: Response;
    try {
      res = await fetch(url, { ...init, headers: { accept: 'application/json', authorization: `Bearer ${this.config.key}`, ...init.headers } });
    } catch (err) {
      const cause = (err as { cause?: { code?: string; message?: string } }).cause;
      throw new CliError(`cannot reach ${this.config.server}: ${cause?.code ?? cause?.message ?? (err as Error).message}`);
    }
    if (!res.ok) {
      const body: unknown = await res.json().catch(() => undefined);
      const parsed = ApiError.safeParse(body);
      const why = parsed.success ? parsed.data.error.message : `${res.status} ${res.statusText}`;
      const hint = res.status === 401 ? ' (check the API key; cairn remote login stores a new one)' : '';
      throw new CliError(`the server refused ${init.method ?? 'GET'} ${path}: ${why}${hint}`, res.status === 404 ? EXIT.negative : EXIT.badInput);
    }
    return res;
  }

  async json<T extends z.ZodType>(path: string, schema: T, init: RequestInit = {}): Promise<z.infer<T>> {
    const res = await this.request(path, init);
    const parsed = schema.safeParse(await res.json().catch(() => undefined));
    if (!parsed.success) throw new CliError(`unexpected answer from ${path}; is ${this.config.server} a Cairn server of this version?`);
    return parsed.data;
  }

  post<T extends z.ZodType>(path: string, body: unknown, schema: T): Promise<z.infer<T>> {
    return this.json(path, schema, { method: 'POST', body: JSON.stringify(body), headers: { 'content-type': 'application/json' } });
  }
}
