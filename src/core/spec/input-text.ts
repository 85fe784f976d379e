// Stored SI values -> the text put back into an input, exact enough that saving the form unchanged
// stores the same number (the short display form is kept whenever it already parses back exactly).
import { formatInput, formatValue, parseValue } from '../units';

const parsesTo = (text: string, unit: string, value: number) => {
  const r = parseValue(text, unit);
  return r.ok && r.value === value;
};

/** Input text for `value` in `unit`: "10.11 MHz" when that is exact, "10.106125 MHz" when more digits are needed. */
export function inputText(value: number | null | undefined, unit: string): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '';
  const short = formatInput(value, unit);
  if (parsesTo(short, unit, value)) return short;
  const bare = unit !== '' && !short.endsWith(unit); // units shown without a prefix carry no symbol in inputs
  for (let digits = 7; digits <= 15; digits++) {
    const full = formatValue(value, unit, digits);
    const t = bare && full.endsWith(` ${unit}`) ? full.slice(0, -unit.length - 1) : full;
    if (parsesTo(t, unit, value)) return t;
  }
  return String(value);
}

/** A fraction as percent text ("12.5" for 0.125) that parses back to the same fraction. */
export function percentText(fraction: number): string {
  for (let digits = 4; digits <= 15; digits++) {
    const t = String(+(fraction * 100).toFixed(digits));
    const r = parseValue(t, '%');
    if (r.ok && r.value / 100 === fraction) return t;
  }
  return String(fraction * 100);
}
