// Findings for one costed line: one caution per problem, in words a builder can act on.

import type { Finding } from '../findings';
import type { LineContext } from './line-options';
import type { LineFlag } from './report-types';

const SOURCE = 'common practice, no published source';

const MESSAGES: Partial<Record<LineFlag, (subject: string) => string>> = {
  'unknown-part': (s) => `${s}: the line points to a part that is not in the parts list; it is not costed.`,
  'unknown-stage': (s) => `${s}: the line's stage no longer exists; it is costed under General.`,
  'bad-qty': (s) => `${s}: quantity per rig is negative or not a number; nothing is ordered.`,
  'no-offer': (s) => `${s}: no supplier offer is entered; the line is in the list at zero cost.`,
  'no-price': (s) => `${s}: the offers have no usable price break; the line is in the list at zero cost.`,
  'no-rate': (s) =>
    `${s}: no exchange rate for the offer currency; add one under costing. The line is in the list at zero cost.`,
};

export function lineSubject(l: Pick<LineContext, 'description' | 'refs' | 'lineId'>): string {
  const name = l.description || `line ${l.lineId}`;
  return l.refs ? `${name} (${l.refs})` : name;
}

export function lineFindings(l: LineContext): Finding[] {
  const subject = lineSubject(l);
  return l.flags.flatMap((flag) => {
    const msg = MESSAGES[flag];
    if (msg === undefined) return [];
    return [
      {
        severity: 'caution' as const,
        rule: `cost.${flag}`,
        subject,
        value: null,
        limit: null,
        unit: '',
        source: SOURCE,
        message: msg(subject),
      },
    ];
  });
}
