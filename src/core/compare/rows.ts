// Side-by-side rows of two or three projects' figures: each row says, against the first project, whether a value
// differs, by how much and whether that is better or worse, in words (so a page shows it without relying on colour).
import type { Better, Metric } from './metrics';

export type Verdict = 'same' | 'better' | 'worse' | 'only-here' | 'missing-here' | 'not-comparable';

export interface CompareCell {
  value: number | null;
  why: string;
  /** against the first column (the first column itself is 'same') */
  verdict: Verdict;
  /** value minus the first column's value, in the row's unit; null when either is missing */
  delta: number | null;
  currency?: string;
}

export interface CompareRow {
  key: string;
  label: string;
  unit: string;
  better: Better;
  cells: CompareCell[];
  /** true when any cell is not 'same' */
  differs: boolean;
}

/**
 * Differences smaller than these are rounding, not a change (half the last digit the pages show).
 * Common practice, no published source.
 */
export const SAME_WITHIN: Record<string, number> = { V: 0.05, VA: 0.5, W: 0.05, dB: 0.05, m: 0.005, cents: 0.5 };

function verdictOf(
  first: Metric | undefined,
  m: Metric | undefined,
  unit: string,
  better: Better,
): Pick<CompareCell, 'verdict' | 'delta'> {
  const a = first?.value ?? null;
  const b = m?.value ?? null;
  if (a === null && b === null) return { verdict: 'same', delta: null };
  if (a === null) return { verdict: 'only-here', delta: null };
  if (b === null) return { verdict: 'missing-here', delta: null };
  // money in two currencies cannot be set against each other without a rate
  if (unit === 'cents' && first?.currency !== m?.currency) return { verdict: 'not-comparable', delta: null };
  const delta = b - a;
  if (Math.abs(delta) < (SAME_WITHIN[unit] ?? 0)) return { verdict: 'same', delta };
  const up = delta > 0;
  return { verdict: up === (better === 'higher') ? 'better' : 'worse', delta };
}

/** Rows over every metric key any column has, in first-seen order; each column is one project's metrics. */
export function compareRows(columns: Metric[][]): CompareRow[] {
  const keys: string[] = [];
  const info = new Map<string, Metric>();
  for (const col of columns)
    for (const m of col)
      if (!info.has(m.key)) {
        keys.push(m.key);
        info.set(m.key, m);
      }
  return keys.map((key) => {
    const { label, unit, better } = info.get(key)!;
    const first = columns[0]?.find((m) => m.key === key);
    const cells = columns.map((col, i) => {
      const m = col.find((x) => x.key === key);
      const v = i === 0 ? { verdict: 'same' as const, delta: null } : verdictOf(first, m, unit, better);
      return { value: m?.value ?? null, why: m ? m.why : 'this project has no such item', currency: m?.currency, ...v };
    });
    return { key, label, unit, better, cells, differs: cells.some((c) => c.verdict !== 'same') };
  });
}

/** The words for a cell's verdict, for pages and text output. */
export const VERDICT_WORDS: Record<Verdict, string> = {
  same: 'same',
  better: 'better',
  worse: 'worse',
  'only-here': 'only in this one',
  'missing-here': 'not in this one',
  'not-comparable': 'other currency',
};
