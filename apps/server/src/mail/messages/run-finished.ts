import type { MailMessage } from '../mailer';
import { describeOutcome, type RunOutcome } from './run-value';

export interface RunFinishedFacts extends RunOutcome {
  to: string;
  specText: string;
  /** How long the run took, start to finish. */
  seconds: number;
  /** The web page of the run. */
  url: string;
  mailAfterSeconds: number;
}

/** "Your run has finished": the graph, the value or bounds, and the link; plain text. */
export function runFinishedMessage(f: RunFinishedFacts): MailMessage {
  const verb = f.status === 'failed' ? 'failed' : 'finished';
  return {
    to: f.to,
    subject: `Your run on ${f.specText} has ${verb}`,
    text: [
      `Your Cairn run on ${f.specText} has ${verb} after ${Math.round(f.seconds)} s.`,
      '',
      describeOutcome(f),
      '',
      `The run, its certificate and its exports: ${f.url}`,
      '',
      `-- `,
      `Cairn mails you when a run of yours takes longer than ${f.mailAfterSeconds} s. You can turn these mails off in your settings.`,
      '',
    ].join('\n'),
  };
}
