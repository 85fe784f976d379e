// Engineering-value parsing and formatting: SI prefixes and the IEC 60062 letter-and-digit (RKM) code.
// Pure; used at the edges (forms, CLI, views) to turn display text into SI numbers and back.

const PREFIX: Record<string, number> = {
  p: 1e-12,
  n: 1e-9,
  u: 1e-6,
  µ: 1e-6,
  μ: 1e-6,
  m: 1e-3,
  '': 1,
  k: 1e3,
  K: 1e3,
  M: 1e6,
  G: 1e9,
};

// Source: IEC 60062:2016 (RKM code), via its published examples: R = 1, L = 1e-3, K = 1e3, M = 1e6, G = 1e9
// for resistance; p n u/µ m for capacitance. The letter stands where the decimal point would be.
const RKM_LETTER: Record<string, number> = {
  L: 1e-3,
  R: 1,
  r: 1,
  K: 1e3,
  k: 1e3,
  M: 1e6,
  G: 1e9,
  p: 1e-12,
  n: 1e-9,
  u: 1e-6,
  µ: 1e-6,
  μ: 1e-6,
  m: 1e-3,
};

/** Unit symbols a field may carry, with aliases as a builder would type them. */
const UNIT_ALIASES: Record<string, string[]> = {
  V: ['V', 'v', 'Vrms', 'Vdc', 'Vpk'],
  A: ['A', 'a'],
  W: ['W', 'w'],
  Ω: ['Ω', 'ohm', 'ohms', 'Ohm'],
  F: ['F'],
  H: ['H', 'h'],
  Hz: ['Hz', 'hz', 'HZ'],
  s: ['s', 'sec'],
  VA: ['VA', 'va'],
  Ah: ['Ah', 'ah'],
  'K/W': ['K/W', '°C/W', 'C/W', 'degC/W'],
  '°C': ['°C', 'C', 'degC'],
  dB: ['dB', 'db', 'dBc', 'dBi'], // a relative level typed with its reference (-30 dBc, 2.15 dBi)
  '%': ['%'],
  'H/t²': ['H/t²', 'H/t2', 'H/turn2', 'H/N2'],
  '': [],
};

export type ParseResult = { ok: true; value: number } | { ok: false; message: string };

function stripUnit(text: string, unit: string): string {
  const aliases = [...(UNIT_ALIASES[unit] ?? [unit])].sort((a, b) => b.length - a.length);
  for (const a of aliases) {
    if (a && text.endsWith(a)) {
      return text.slice(0, -a.length).trim();
    }
  }
  return text;
}

/**
 * Parse "4k7", "2R2", "R47", "100n", "4u7", "350m", "1.5A", "350 mA", "13.8V", "10.1 MHz", "1e-6", "47 µF".
 * `unit` is the field's SI unit; a matching unit symbol (with its aliases) may follow the number.
 */
export function parseValue(input: string, unit: string): ParseResult {
  const expected = `a number such as ${example(unit)}`;
  const raw = String(input ?? '').trim().replace(/\s+/g, ' ');
  if (raw === '') return { ok: false, message: `is empty: enter ${expected}` };
  // "1,500" is 1.5 if the comma is a decimal point but 1500 to many readers: ask instead of guessing
  const grouped = /(?:^|[^\d.,])([1-9]\d{0,2}),(\d{3})(?![\d.,])/.exec(raw);
  if (grouped) {
    return {
      ok: false,
      message: `"${raw}" is ambiguous (a comma is read as the decimal point): write ${grouped[1]}${grouped[2]} or ` +
        `${`${grouped[1]}.${grouped[2]}`.replace(/\.?0+$/, '')}`,
    };
  }
  let text = raw.replace(',', '.');
  if (unit === '%') {
    text = text.replace(/%$/, '').trim();
  } else {
    text = stripUnit(text, unit).trim();
    // "10.1 MHz" -> after stripping "Hz": "10.1 M"
  }
  text = text.replace(/\s+/g, '');
  // plain number with optional exponent and optional prefix: 13.8, 1e-6, 350m, 10.1M, 47µ
  let m = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)([pnuµμmkKMG]?)$/.exec(text);
  if (m) {
    const scale = PREFIX[m[2]];
    // divide by the reciprocal for sub-unit prefixes so "100n" is exactly 1e-7
    const value = scale < 1 ? Number(m[1]) / Math.round(1 / scale) : Number(m[1]) * scale;
    return Number.isFinite(value) ? { ok: true, value } : { ok: false, message: `is out of range: enter ${expected}` };
  }
  // RKM: digits, one letter in place of the decimal point, digits (4k7, 2R2, R47, 4u7, 47K3)
  m = /^([+-]?)(\d*)([LRrKkMGpnuµμm])(\d*)$/.exec(text);
  if (m && (m[2] !== '' || m[4] !== '')) {
    const mantissa = Number(`${m[2] || '0'}.${m[4] || '0'}`);
    const scale = RKM_LETTER[m[3]];
    const value = (m[1] === '-' ? -1 : 1) * (scale < 1 ? mantissa / Math.round(1 / scale) : mantissa * scale);
    return { ok: true, value };
  }
  return { ok: false, message: `"${raw}" is not understood: enter ${expected}` };
}

export function example(unit: string): string {
  switch (unit) {
    case 'Ω':
      return '4k7, 2R2, R47 or 470 Ω';
    case 'F':
      return '100n, 4u7, 2200 µF or 470p';
    case 'H':
      return '1.45 µH or 1u45';
    case 'A':
      return '1.5 A, 350 mA or 350m';
    case 'V':
      return '13.8 V or 500 mV';
    case 'Hz':
      return '10.1 MHz or 60 Hz';
    case 'W':
      return '20 W or 500 mW';
    case '%':
      return '10 %';
    case 'K/W':
      return '2.5 °C/W';
    case '°C':
      return '40 °C';
    case 's':
      return '5 ms or 0.005';
    default:
      return `12.5${unit ? ' ' + unit : ''}`;
  }
}

const FORMAT_PREFIXES: [number, string][] = [
  [1e9, 'G'],
  [1e6, 'M'],
  [1e3, 'k'],
  [1, ''],
  [1e-3, 'm'],
  [1e-6, 'µ'],
  [1e-9, 'n'],
  [1e-12, 'p'],
];

/** Units that are shown without an SI prefix (a prefix would read oddly). */
const NO_PREFIX = new Set(['°C', 'K/W', 'dB', 'dBc', 'dBm', 'dBW', '%', '', 'S', 'turns', 'VA']);

/**
 * Format an SI value with an engineering prefix and symbol: formatValue(0.35, 'A') -> "350 mA",
 * formatValue(4700, 'Ω') -> "4.7 kΩ". `digits` = significant digits (default 3). Non-finite -> "—".
 */
export function formatValue(value: number | null | undefined, unit: string, digits = 3): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  if (NO_PREFIX.has(unit)) return unit ? `${trimNumber(value, digits)} ${unit}` : trimNumber(value, digits);
  if (value === 0) return `0 ${unit}`;
  const abs = Math.abs(value);
  // capacitance is written in µF by builders, never mF
  const usable = unit === 'F' ? FORMAT_PREFIXES.filter(([, p]) => p !== 'm' && p !== 'k') : FORMAT_PREFIXES;
  const [scale, prefix] = usable.find(([s]) => abs >= s * 0.9995) ?? usable[usable.length - 1];
  return `${trimNumber(value / scale, digits)} ${prefix}${unit}`;
}

function trimNumber(value: number, digits: number): string {
  if (value === 0) return '0';
  const abs = Math.abs(value);
  const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(abs)));
  const fixed = value.toFixed(Math.min(decimals, 9));
  return fixed.includes('.') ? fixed.replace(/\.?0+$/, '') : fixed;
}

/** Plain text for an input field: the value as the user would type it back (round-trips through parseValue). */
export function formatInput(value: number | null | undefined, unit: string): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '';
  if (NO_PREFIX.has(unit)) return trimNumber(value, 6);
  return formatValue(value, unit, 6);
}
