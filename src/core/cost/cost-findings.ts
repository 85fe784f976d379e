// Findings for one costed line: one caution per problem, in words a builder can act on.

import type { Finding } from '../findings';
import type { LineContext } from './line-options';
import type { LineFlag } from './report-types';

const SOURCE = 'cost.practice' as const;

// The subject (part and designators) is shown beside the message, so messages do not repeat it.
const MESSAGES: Partial<Record<LineFlag, string>> = {
  'unknown-part': 'The line points to a part that is not in the parts catalog; it is not costed.',
  'unknown-stage': "The line's stage no longer exists; it is costed under General.",
  'bad-qty': 'The quantity per rig is negative, not a number or absurdly large; nothing is ordered.',
  'too-large':
    'The price or exchange rate gives an absurdly large cost; check the offer. The line stays in the list at zero ' +
      'cost.',
  'no-offer': 'No supplier offer is entered; the line stays in the list at zero cost.',
  'no-price': 'The offers have no usable price break; the line stays in the list at zero cost.',
  'no-rate':
    'No exchange rate for the offer currency (add one under costing); the line stays in the list at zero cost.',
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
        message: msg,
      },
    ];
  });
}
