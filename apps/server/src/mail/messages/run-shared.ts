import type { MailMessage } from '../mailer';
import { describeOutcome, type RunOutcome } from './run-value';

export interface RunSharedFacts extends RunOutcome {
  to: string;
  specText: string;
  /** Who shared it (their login). */
  sharedBy: string;
  /** The share link: anyone holding it may read the run, without signing in. */
  url: string;
}

/** "A run was shared with you": who shared what, its value so far, and the link; plain text. */
export function runSharedMessage(f: RunSharedFacts): MailMessage {
  return {
    to: f.to,
    subject: `A run on ${f.specText} was shared with you`,
    text: [
      `${f.sharedBy} shared a Cairn run with you: ${f.specText}.`,
      '',
      describeOutcome(f),
      '',
      `Open it (no sign-in needed): ${f.url}`,
      '',
      '-- ',
      'Anyone holding this link can read the run; its owner can stop sharing it at any time.',
      '',
    ].join('\n'),
  };
}
