// Input hygiene for the supply engine: non-finite numbers in the supply data become null (optional fields)
// or 0 (required fields) with a 'fail' finding, so every later computation sees plain finite numbers.
import type { Finding } from '../findings';
import type { Supply } from '../model';

/** Fields that may be null ("not entered"): a non-finite value there means "not entered". */
const NULLABLE = new Set(['bleederOhm', 'capacitorRatedV', 'capacitorRippleA', 'ripplePpTargetV', 'fuseA', 'resistanceOhm', 'efficiency', 'maxOutputA', 'maxInputV', 'thetaSaKPerW', 'primaryFuseA']);

export function normalizeSupply(supply: Supply): { supply: Supply; findings: Finding[] } {
  const findings: Finding[] = [];
  const walk = (v: unknown, key: string, owner: string): unknown => {
    if (typeof v === 'number') {
      if (Number.isFinite(v)) return v;
      findings.push({ severity: 'fail', rule: 'input.number', subject: owner, value: null, limit: null, unit: '', source: 'Input check', message: `"${key}" is not a usable number; it is treated as ${NULLABLE.has(key) ? 'not entered' : '0'}.` });
      return NULLABLE.has(key) ? null : 0;
    }
    if (Array.isArray(v)) return v.map((x) => walk(x, key, owner));
    if (v && typeof v === 'object') {
      const o = v as Record<string, unknown>;
      const name = typeof o.name === 'string' ? o.name : owner;
      return Object.fromEntries(Object.entries(o).map(([k, x]) => [k, walk(x, k, name)]));
    }
    return v;
  };
  return { supply: walk(supply, 'supply', 'Supply') as Supply, findings };
}
