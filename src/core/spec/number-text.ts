// Text <-> SI value for one number field: a bare number is read in the field's display unit (mA, µF, %); a number
// with an SI prefix, an IEC 60062 letter code (4k7, 100n) or a unit symbol is read as written. A refused value gets
// a "did you mean …?" where a common unit slip explains it.
import { formatValue, parseValue } from '../units';
import type { NumberField } from './field';
import { inputText, percentText } from './input-text';

export type NumberParse = { ok: true; value: number } | { ok: false; message: string };

const BARE = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
/** An inductance factor written per 100 turns: "49 µH/100t", "49uH/100 turns" (spaces already removed). */
const AL_PER_100_TURNS = /^([+-]?(?:\d+\.?\d*|\.\d+))(?:µ|μ|u)H\/100(?:t|turns?)?$/i;
/** An area with a prefixed length unit: "12 mm²", "0.12cm2" (spaces already removed); the prefix is squared. */
const AREA = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)(mm|cm|m)(?:²|2|\^2)$/;
/** Divisor to m² (dividing by the whole number, as a bare number in mm² is read, so "24.7 mm²" and "24.7" agree). */
const AREA_DIVISOR: Record<string, number> = { mm: 1e6, cm: 1e4, m: 1 };

/** SI value of `text` for field `f`, or a message (without the label) saying what is wrong. */
export function readNumber(text: string, f: NumberField): NumberParse {
  const raw = String(text ?? '').trim();
  if (f.money) {
    const m = moneyCents(raw, f.moneyDigits);
    if (!m.ok) return m;
    const problem = rangeProblem(m.value, f);
    return problem ? { ok: false, message: `${problem}; you entered "${raw}"` } : m;
  }
  const compact = raw.replace(/\s+/g, '').replace(',', '.');
  let value: number;
  const al = f.unit === 'H/t²' ? AL_PER_100_TURNS.exec(compact) : null;
  // Source: iron-powder toroid data sheets give AL in µH per 100 turns, L = AL × (N / 100)²,
  // so 1 µH/100 t = 0.1 nH/t²
  if (al) value = Number(al[1]) * 1e-10;
  else if (f.unit === 'm²' && AREA.test(compact)) {
    const m = AREA.exec(compact)!;
    // Source: definition of area units, 1 mm² = (10⁻³ m)² = 10⁻⁶ m²
    // (an SI prefix on a squared unit is squared)
    value = Number(m[1]) / AREA_DIVISOR[m[2]];
  }
  else if (BARE.test(compact) && !/^\d{1,3},\d{3}$/.test(raw.replace(/\s+/g, ''))) {
    value = inDisplay(Number(compact), f.display.scale);
  } else {
    const r = parseValue(raw, f.unit);
    if (!r.ok) return { ok: false, message: r.message.replace(/a number such as [^:;]+$/, exampleText(f)) };
    value = f.unit === '%' ? r.value * 0.01 : r.value;
  }
  if (!Number.isFinite(value)) return { ok: false, message: `is out of range: enter ${exampleText(f)}` };
  const problem = rangeProblem(value, f);
  if (!problem) return { ok: true, value };
  const slip = BARE.test(compact) ? unitSlip(Number(compact), f) : '';
  return { ok: false, message: `${problem}; you entered "${raw}"${slip}` };
}

/** Why `value` (SI) is outside the field's range, or '' when it is inside. */
export function rangeProblem(value: number, f: NumberField): string {
  if (!Number.isFinite(value)) return 'is not a usable number';
  if (f.money && !Number.isInteger(value)) return 'must be a whole number of cents';
  if (f.integer && !Number.isInteger(value / (f.display.scale === 0.01 ? 0.01 : 1))) return 'must be a whole number';
  // "more than min" means a usable amount above it: a subnormal such as 5e-324 passes `> 0` and later divides to
  // Infinity. Common practice, no published source: 1e-15 of the field's range is below anything a builder enters.
  const lowOk = f.exclusiveMin ? value > f.min + Math.abs(f.max - f.min) * 1e-15 : value >= f.min;
  if (lowOk && value <= f.max) return '';
  return `must be ${f.exclusiveMin ? 'more than' : 'at least'} ${show(f.min, f)} and at most ${show(f.max, f)}`;
}

/** A limit as the builder reads it: in the display unit, or with a prefix for very large or small values. */
export function show(value: number, f: NumberField): string {
  if (f.money) return `${moneyText(value, f.moneyDigits)}${f.display.symbol ? ' ' + f.display.symbol : ''}`;
  if (f.unit === '%') return `${percentText(value)} %`;
  if (hasPrefixes(f.unit)) return formatValue(value, f.unit, 4);
  const sym = f.display.symbol;
  return `${trim(value / f.display.scale)}${sym ? ' ' + sym : ''}`;
}

// divide by the reciprocal for sub-unit scales so "350" mA is exactly 0.35 A (350 * 1e-3 is not)
const inDisplay = (n: number, scale: number) => (scale < 1 ? n / Math.round(1 / scale) : n * scale);

const hasPrefixes = (unit: string) => !['°C', 'K/W', 'dB', '%', ''].includes(unit);
const trim = (x: number) => String(Number(x.toPrecision(6)));

/** The unit slips builders make, most likely first: capacitors are thought of in µF, pF or nF; currents in mA. */
const SLIPS: Record<string, [number, string][]> = {
  F: [[1e-6, 'µ'], [1e-12, 'p'], [1e-9, 'n']],
  H: [[1e-6, 'µ'], [1e-9, 'n'], [1e-3, 'm']],
  A: [[1e-3, 'm'], [1, ''], [1e-6, 'µ']],
  V: [[1, ''], [1e-3, 'm'], [1e3, 'k']],
  W: [[1, ''], [1e-3, 'm'], [1e3, 'k']],
  Ω: [[1, ''], [1e3, 'k'], [1e6, 'M']],
  Hz: [[1e6, 'M'], [1e3, 'k'], [1, '']],
  s: [[1e-3, 'm'], [1, ''], [1e-6, 'µ']],
};

function unitSlip(typed: number, f: NumberField): string {
  for (const [scale, prefix] of SLIPS[f.unit] ?? []) {
    if (scale === f.display.scale) continue;
    const v = typed * scale;
    if (!rangeProblem(v, f)) return ` — did you mean ${trim(typed)} ${prefix}${f.unit}?`;
  }
  return '';
}

/** "a number in mA such as 350" — what to type in this box. */
export function exampleText(f: NumberField): string {
  const sym = f.display.symbol;
  const ex = f.example ?? exampleNumber(f);
  const alt = f.unit === 'H/t²' ? ', or in µH per 100 turns such as 49 µH/100t' : '';
  return sym ? `a number in ${sym} such as ${ex}${alt}` : `a number such as ${ex}`;
}

/**
 * An example that fits the field, as a bare number in its display unit (so "a number in V such as 0.5", never
 * "such as 500 mV"): its default, else the first round number inside its range, else the middle of the range.
 */
export function exampleNumber(f: NumberField): string {
  const fits = (v: number | null): v is number =>
    v !== null && Number.isFinite(v) && rangeProblem(v, f) === '' && v !== 0;
  const round = [1, 10, 100, 1000, 0.1, 10_000, 0.01].map((n) => inDisplay(n, f.display.scale));
  const mid = (f.min + f.max) / 2;
  const value = [f.default, ...round, f.integer ? Math.round(mid) : mid].find(fits) ?? f.default ?? f.min;
  if (f.money) return moneyText(value, f.moneyDigits);
  const bare = f.display.scale < 1 ? value * Math.round(1 / f.display.scale) : value / f.display.scale;
  return String(Number(bare.toPrecision(6)));
}

/** The text put back into the box for a stored SI value; it parses back to exactly the same value. */
export function numberText(value: number | null, f: NumberField): string {
  if (value === null || !Number.isFinite(value)) return '';
  if (f.money) return moneyText(value, f.moneyDigits);
  if (f.unit === '%') return percentText(value);
  if (f.display.scale !== 1) {
    const bare = value / f.display.scale;
    const t = String(Number(bare.toPrecision(12)));
    const back = readNumber(t, { ...f, min: -Infinity, max: Infinity, exclusiveMin: false, integer: false });
    if ((bare === 0 || (Math.abs(bare) >= 0.1 && Math.abs(bare) < 1e4)) && back.ok && back.value === value) return t;
  }
  const text = inputText(value, f.unit);
  // a bare fallback would be read in the display unit: give it the SI unit symbol
  return f.display.scale !== 1 && BARE.test(text) ? `${text} ${f.unit}` : text;
}

/**
 * Whole minor units as the major-unit text of a currency with `digits` decimals (ISO 4217 minor unit; 2 when not
 * given): 95 -> "0.95", JPY (0) 150 -> "150", KWD (3) 125 -> "0.125".
 */
export function moneyText(cents: number, digits = 2): string {
  if (!Number.isInteger(cents)) return String(cents / 10 ** digits);
  const per = 10 ** digits;
  const whole = `${cents < 0 ? '-' : ''}${Math.floor(Math.abs(cents) / per)}`;
  return digits === 0 ? whole : `${whole}.${String(Math.abs(cents) % per).padStart(digits, '0')}`;
}

const DECIMALS_WORD = ['no', 'one', 'two', 'three', 'four'];

/**
 * An amount typed in the major unit ("0.95", "12", "0,95") -> whole minor units of a currency with `digits` decimals
 * (2 when not given); more decimals than that are refused (amounts are kept in whole minor units, never rounded
 * silently). The message has no label.
 */
export function moneyCents(input: string, digits = 2): NumberParse {
  const t = input.trim();
  const m = /^(\d*)(?:[.,](\d*))?$/.exec(t);
  if (!m || m[1] + (m[2] ?? '') === '')
    return {
      ok: false,
      message: `"${t}" is not an amount: enter e.g. ${digits === 0 ? '150' : `0.${'9'.padEnd(digits, '5')}`}`,
    };
  // zeros beyond the minor unit change nothing ("150.00" yen is 150 yen)
  const frac =
    (m[2] ?? '').length > digits && /^0*$/.test((m[2] ?? '').slice(digits))
      ? (m[2] ?? '').slice(0, digits)
      : (m[2] ?? '');
  if (frac.length > digits) {
    if (digits === 2)
      return { ok: false, message: `"${t}" has more than two decimals; amounts are kept in whole cents` };
    return {
      ok: false,
      message:
        digits === 0
          ? `"${t}" has decimals; this currency has none (ISO 4217 minor unit)`
          : `"${t}" has more than ${DECIMALS_WORD[digits] ?? digits} decimals; amounts are kept in whole minor units ` +
            `(ISO 4217)`,
    };
  }
  const cents = Number(m[1] || '0') * 10 ** digits + Number(frac.padEnd(digits, '0') || '0');
  return Number.isSafeInteger(cents) ? { ok: true, value: cents } : { ok: false, message: `"${t}" is too large` };
}
