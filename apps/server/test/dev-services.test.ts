import nodemailer from 'nodemailer';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createLogger, PortTakenError, startDevServices } from '../src/index';

type Services = Awaited<ReturnType<typeof startDevServices>>;
let dev: Services;
const logger = createLogger('silent');

beforeAll(async () => {
  dev = await startDevServices('127.0.0.1', 0, 0, logger);
});
afterAll(() => dev.close());

describe('local mail catcher', () => {
  it('catches a message sent over SMTP and lists it in the mailbox', async () => {
    const transport = nodemailer.createTransport({ host: '127.0.0.1', port: dev.smtpPort, secure: false, ignoreTLS: true });
    await transport.sendMail({
      from: 'cairn@localhost',
      to: 'tobias@tollgate-lattice.example',
      subject: 'Your run on grid:5x9 has finished',
      text: 'rank number 7',
    });
    const list = (await (await fetch(`${dev.url}/mail`)).json()) as { id: number; subject: string; to: string[] }[];
    const found = list.find((m) => m.subject === 'Your run on grid:5x9 has finished');
    expect(found?.to).toEqual(['tobias@tollgate-lattice.example']);
    const raw = await (await fetch(`${dev.url}/mail/${found!.id}`)).text();
    expect(raw).toContain('rank number 7');
    expect((await fetch(`${dev.url}/mail/999999`)).status).toBe(404);
  });

  it('names the variable to change when its port is taken', async () => {
    const url = new URL(dev.url);
    await expect(startDevServices('127.0.0.1', Number(url.port), 0, logger)).rejects.toThrow(PortTakenError);
    await expect(startDevServices('127.0.0.1', 0, dev.smtpPort, logger)).rejects.toThrow(/CAIRN_SMTP_PORT/);
  });
});
