// Catalog parts against the computed design: a reservoir capacitor on the parts list whose ratings fall short of
// what its rail needs is flagged. Parts are matched to rails by capacitance (within 2 %), the only link a parts
// list gives; a rail whose capacitance no listed part matches is reported so the builder can check by hand.
import type { Project } from './model';
import type { Finding } from './findings';
import type { SupplyReport } from './power/report-types';
import { CAP_VOLTAGE_MARGIN } from './power/reservoir';

const CAPACITANCE_MATCH = 0.02; // relative; E6 steps are ~50 % apart, so 2 % cannot confuse two values

const num = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);

export function catalogFindings(project: Project, supply: SupplyReport | null): Finding[] {
  if (!supply) return [];
  const out: Finding[] = [];
  const listed = new Set(project.bom.map((b) => b.partId));
  const capacitors = project.parts.filter((p) => p.category === 'capacitor-reservoir' && listed.has(p.id));
  for (const rail of supply.rails) {
    if (rail.kind !== 'rectified') continue;
    const fittedF = rail.reservoir.fittedF;
    const matches = capacitors.filter((p) => {
      const c = num(p.ratings.capacitanceF);
      return c !== null && fittedF > 0 && Math.abs(c - fittedF) / fittedF <= CAPACITANCE_MATCH;
    });
    if (!matches.length) {
      if (capacitors.length)
        out.push({
          severity: 'caution',
          rule: 'catalog.reservoir-match',
          subject: `${rail.railName} reservoir`,
          value: fittedF,
          limit: null,
          unit: 'F',
          source: 'design.parts-list',
          message:
            'No reservoir capacitor on the parts list has this capacitance (with its capacitance entered as a ' +
              'rating); check the part you buy by hand.',
        });
      continue;
    }
    // Source: capacitor rating must exceed the no-load high-mains peak, ripple rating the simulated RMS (ref §4.2)
    // Same margin as the fitted-part check (reservoir.ts): 1.2 x the peak, not the next standard step above it, so a
    // part rated between the two is judged alike on both pages. Common practice, no published source (ref §4.2 [D]).
    const needV = rail.reservoir.noLoadPeakHighV * CAP_VOLTAGE_MARGIN;
    const needA = rail.reservoir.thermalRippleA;
    for (const part of matches) {
      const v = num(part.ratings.voltageV);
      const a = num(part.ratings.rippleA);
      const subject = `${part.description} (${rail.railName})`;
      if (v === null || a === null) {
        out.push({
          severity: 'caution',
          rule: 'catalog.reservoir-ratings',
          subject,
          value: null,
          limit: null,
          unit: '',
          source: 'design.parts-list',
          message:
            'Enter the rated voltage and the ripple current (RMS) of this catalog part on the parts catalog page so ' +
              'it can be checked against the design.',
        });
        continue;
      }
      if (v < rail.reservoir.noLoadPeakHighV)
        out.push({
          severity: 'fail',
          rule: 'catalog.reservoir-voltage',
          subject,
          value: v,
          limit: rail.reservoir.noLoadPeakHighV,
          unit: 'V',
          source: 'supply.capacitor-voltage',
          message: `Rated ${v} V but the rail reaches ${rail.reservoir.noLoadPeakHighV.toFixed(1)} V with no load at ` +
            `high mains: choose a higher-voltage part.`,
        });
      else if (v < needV)
        out.push({
          severity: 'caution',
          rule: 'catalog.reservoir-voltage',
          subject,
          value: v,
          limit: needV,
          unit: 'V',
          source: 'supply.capacitor-voltage',
          message: `Rated ${v} V, under 20 % above the ${rail.reservoir.noLoadPeakHighV.toFixed(1)} V no-load peak ` +
            `(${needV.toFixed(1)} V); mains surges can exceed ` +
            `it${rail.reservoir.recommendedRatedV !== null ? `: choose ${rail.reservoir.recommendedRatedV} V` : ''}.`,
        });
      if (a < needA)
        out.push({
          severity: 'fail',
          rule: 'catalog.reservoir-ripple',
          subject,
          value: a,
          limit: needA,
          unit: 'A',
          source: 'supply.capacitor-ripple',
          message: `Ripple rating ${a} A RMS is below the ${needA.toFixed(2)} A it carries in CW operation: it will ` +
            `run hot and age early.`,
        });
      if (v >= needV && a >= needA)
        out.push({
          severity: 'ok',
          rule: 'catalog.reservoir',
          subject,
          value: v,
          limit: needV,
          unit: 'V',
          source: 'design.parts-list',
          message: `The listed part (${v} V, ${a} A ripple) covers this rail (${needV.toFixed(1)} V with margin, ` +
            `${needA.toFixed(2)} A).`,
        });
    }
  }
  return out;
}
