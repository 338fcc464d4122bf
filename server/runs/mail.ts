import type { OutgoingMail } from '../mail/mailer';
import type { Run } from '../db/entities';

const outcome = (r: Run): string =>
  r.status === 'done' ? 'is done' : r.status === 'cancelled' ? 'was cancelled' : 'failed';

/** The message a run's starter gets when it ends, linking to its result page. */
export function runFinishedMail(p: { to: string; run: Run; link: string }): OutgoingMail {
  const { run } = p;
  const what = run.kind === 'cable-sweep' ? 'Cable sweep' : 'Khovanov homology';
  return {
    to: p.to,
    subject: `Your run ${outcome(run)}: ${what} of ${run.label}`,
    text: [
      `${what} of "${run.label}" over ${run.ring}${run.reduced ? ' (reduced)' : ''} ${outcome(run)}.`,
      ...(run.error ? ['', run.error] : []),
      ...(run.reusedFrom ? ['', 'The same diagram had been computed before; its stored result was reused.'] : []),
      '',
      'Open the result:',
      p.link,
    ].join('\n'),
  };
}
