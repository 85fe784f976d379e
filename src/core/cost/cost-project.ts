// costProject: quantities, supplier choice, totals and findings for a project's parts list. Pure.

import type { Finding } from '../findings';
import type { Project } from '../model';
import { cheapestBySupplier, GENERAL_STAGE_NAME, kitsOf, prepareLines, type LineContext } from './line-options';
import { convertCents, formatMoney, minorRate, rateFor, roundHalfUp } from './money';
import { breakMinQtyAt } from './quantities';
import type { CostLine, CostReport, SingleSupplierComparison, StageSubtotal, SupplierUse } from './report-types';
import { COST_SECTION_LABELS, SECTION_RULE, type CostSection } from './sections';
import { choosePlan, DEFAULT_EXACT_LIMIT, planSingleSupplier, type PlanChoice, type PlanInput } from './supplier-plan';
import { lineFindings } from './cost-findings';

export interface CostOptions {
  /** Largest supplier count solved exactly by subset enumeration (default 12). */
  exactLimit?: number;
  /** Node budget of the branch and bound used above exactLimit (default 200000). */
  nodeLimit?: number;
}

const SOURCE = 'cost.practice' as const;

export const COST_NOTES: readonly string[] = [
  'Needed pieces per line = ceil(qty per rig x kits x (1 + attrition)) + spares per line; lines with no use get no ' +
    'spares.',
  'Order quantity = the cheapest quantity at least the need that the offer allows (minimum order, lowest price break, '
    + 'order multiple): the plain order, or more pieces up to a higher price break when that costs less in total.',
  'Each line is bought from one offer; splitting a line between suppliers is not considered.',
  'Unit price = the price break with the highest minimum quantity not above the order quantity.',
  'Currency conversion: line cost (and each shipping charge) converted once and rounded half-up to a whole minor unit.',
  'Amounts are kept and shown in each currency\'s own minor unit (ISO 4217): no decimals for JPY, two for USD and EUR.',
  'Shipping is paid once per supplier used, converted from that supplier\'s currency.',
  'Per-kit figures = build figures / kits, rounded half-up.',
  SECTION_RULE,
];

/** A supplier's shipping charge in project minor units, or why it cannot be counted (then costing counts 0). */
export function supplierShipping(
  project: Project,
  name: string,
): { ok: true; cents: number } | { ok: false; message: string } {
  const entry = project.costing.suppliers.find((s) => s.name.trim().toLowerCase() === name.trim().toLowerCase());
  if (entry === undefined)
    return { ok: false, message: `Supplier "${name}" has no shipping entry; shipping counted as 0.` };
  const rate = rateFor(entry.currency, project.currency, project.costing.exchangeRates);
  if (rate === null)
    return { ok: false, message: `No exchange rate for ${entry.currency}: shipping from "${name}" counted as 0.` };
  if (!Number.isFinite(entry.shippingCents) || entry.shippingCents < 0)
    return { ok: false, message: `Shipping of "${name}" is not a valid amount; counted as 0.` };
  return { ok: true, cents: convertCents(entry.shippingCents, minorRate(rate, entry.currency, project.currency)) };
}

function shippingFor(project: Project, name: string, findings: Finding[]): number {
  const s = supplierShipping(project, name);
  if (s.ok) return s.cents;
  findings.push({
    severity: 'caution',
    rule: 'cost.shipping',
    subject: name,
    value: null,
    limit: null,
    unit: '',
    source: SOURCE,
    message: s.message,
  });
  return 0;
}

function methodNote(choice: PlanChoice, n: number, limit: number, total: number, currency: string): string {
  if (n === 0) return 'No supplier could be chosen: no line has a usable priced offer.';
  const scope = 'with each line bought from one offer at its cheapest allowed quantity';
  if (choice.method === 'exact') {
    return `Exact: all ${choice.examined} supplier combinations of ${n} suppliers compared, ${scope}; `
      + 'the plan is the cheapest possible.';
  }
  if (choice.proven) {
    return `Exact: ${n} suppliers is more than ${limit} for comparing every combination, so a branch and bound `
      + `search (${choice.examined} nodes) was used, ${scope}; it proved the plan the cheapest possible.`;
  }
  const lb = choice.lowerBoundCents ?? total;
  return (
    `Not proven: with ${n} suppliers the branch and bound search stopped after ${choice.examined} nodes, ${scope}; ` +
    `the plan costs ${formatMoney(total, currency)} and no plan can cost less than ${formatMoney(lb, currency)} ` +
    `(at most ${formatMoney(total - lb, currency)} might be saved).`
  );
}

export function costProject(project: Project, options: CostOptions = {}): CostReport {
  const exactLimit = options.exactLimit ?? DEFAULT_EXACT_LIMIT;
  const findings: Finding[] = [];
  const kits = kitsOf(project);
  if (kits === 0) {
    findings.push({
      severity: 'fail',
      rule: 'cost.kits',
      subject: 'Number of kits',
      value: Number.isFinite(project.kits) ? project.kits : null,
      limit: 1,
      unit: '',
      source: SOURCE,
      message: 'The number of kits must be a whole number of at least 1; nothing was costed.',
    });
  }
  const { attritionFraction: a } = project.costing;
  if (!Number.isFinite(a) || a < 0) {
    findings.push({
      severity: 'caution',
      rule: 'cost.attrition',
      subject: 'Attrition allowance',
      value: Number.isFinite(a) ? a : null,
      limit: 0,
      unit: '',
      source: SOURCE,
      message: 'The attrition allowance is negative or not a number; 0 was used.',
    });
  }

  const lines = prepareLines(project);
  const purchasable = lines.filter((l) => l.options.length > 0);
  const bySupplier = purchasable.map((l) => cheapestBySupplier(l.options));
  const names = [...new Set(bySupplier.flatMap((m) => [...m.keys()]))].sort();
  const input: PlanInput = {
    suppliers: names,
    shippingCents: names.map((n) => shippingFor(project, n, findings)),
    lineCosts: bySupplier.map((m) => names.map((n) => m.get(n)?.costCents ?? Infinity)),
  };
  const choice = choosePlan(input, exactLimit, options.nodeLimit);
  const { method, plan } = choice;
  // Every purchasable line has at least one supplier, so the all-suppliers subset covers it: plan is set.
  const assignment = plan?.assignment ?? [];

  const chosen = new Map<LineContext, string>();
  purchasable.forEach((l, i) => chosen.set(l, names[assignment[i]]));
  const costLines: CostLine[] = lines.map((l) => toCostLine(l, chosen.get(l) ?? null));
  for (const l of lines) findings.push(...lineFindings(l));

  const partsCents = costLines.reduce((s, l) => s + l.lineCostCents, 0);
  const shippingCents = plan?.shippingCents ?? 0;
  const buildCents = partsCents + shippingCents;
  const unpricedLines = costLines.filter((l) => l.supplier === null && l.neededQty > 0).length;
  if (unpricedLines > 0) {
    findings.push({
      severity: 'caution',
      rule: 'cost.incomplete',
      subject: 'Build total',
      value: unpricedLines,
      limit: 0,
      unit: '',
      source: SOURCE,
      message: `The totals leave out ${unpricedLines} line(s) with no usable price; the real cost is higher.`,
    });
  } else if (kits > 0) {
    findings.push({
      severity: 'ok',
      rule: 'cost.complete',
      subject: 'Build total',
      value: 0,
      limit: 0,
      unit: '',
      source: SOURCE,
      message: 'Every needed line has a priced offer.',
    });
  }

  for (const st of project.stages) {
    if (project.bom.some((b) => b.stageId === st.id)) continue;
    findings.push({
      severity: 'caution',
      rule: 'cost.empty-stage',
      subject: st.name,
      value: 0,
      limit: 1,
      unit: 'lines',
      source: 'cost.stage-coverage',
      message:
        'This stage has no parts on the parts list, so its cost is missing from the totals; add its parts (or put ' +
          'them on it from General).',
    });
  }

  const suppliers: SupplierUse[] = (plan?.used ?? []).map((s) => {
    const mine = costLines.filter((l) => l.supplier === names[s]);
    return {
      supplier: names[s],
      lineCount: mine.length,
      partsCents: mine.reduce((t, l) => t + l.lineCostCents, 0),
      shippingCents: input.shippingCents[s],
    };
  });

  return {
    currency: project.currency,
    kits,
    method,
    methodNote: methodNote(choice, names.length, exactLimit, plan?.totalCents ?? 0, project.currency),
    proven: choice.proven,
    lowerBoundCents: choice.lowerBoundCents,
    candidateSuppliers: names.length,
    lines: costLines,
    stages: stageSubtotals(project, lines, costLines),
    sections: (['supply', 'rf', 'other'] as CostSection[]).map((section) => {
      const mine = costLines.filter((l) => l.section === section);
      return {
        section,
        label: COST_SECTION_LABELS[section],
        partsCents: mine.reduce((t, l) => t + l.lineCostCents, 0),
        lineCount: mine.length,
      };
    }),
    suppliers,
    singleSupplier: singleComparison(input, purchasable.length, plan?.totalCents ?? 0, unpricedLines),
    totals: {
      partsCents,
      shippingCents,
      buildCents,
      perKitCents: kits > 0 ? roundHalfUp(buildCents / kits) : null,
      perKitPartsCents: kits > 0 ? roundHalfUp(partsCents / kits) : null,
      unpricedLines,
    },
    raisedSavingsCents: costLines.reduce((t, l) => t + (l.raised?.savingCents ?? 0), 0),
    findings,
    notes: [...COST_NOTES],
  };
}

function toCostLine(l: LineContext, supplier: string | null): CostLine {
  const base = {
    lineId: l.lineId, partId: l.partId, description: l.description, value: l.value, category: l.category, refs: l.refs,
    roleId: l.roleId, qtyPerRig: l.qtyPerRig, stageId: l.stage?.id ?? null, stageName: l.stageName, section: l.section,
    neededQty: l.neededQty, flags: l.flags,
  };
  const option = supplier === null ? undefined : cheapestBySupplier(l.options).get(supplier);
  if (option === undefined) {
    return {
      ...base,
      orderQty: 0,
      breakMinQty: null,
      supplier: null,
      offerId: null,
      sku: null,
      offerCurrency: null,
      unitPriceCents: null,
      offerCostCents: null,
      exchangeRate: null,
      lineCostCents: 0,
      raised: null,
    };
  }
  const plainCents = convertCents(option.plain.costCents, option.minorRate);
  return {
    ...base,
    orderQty: option.quote.qty,
    breakMinQty: breakMinQtyAt(option.offer.breaks, option.quote.qty),
    supplier,
    offerId: option.offer.id,
    sku: option.offer.sku,
    offerCurrency: option.offer.currency,
    unitPriceCents: option.quote.unitPriceCents,
    offerCostCents: option.quote.costCents,
    exchangeRate: option.rate,
    lineCostCents: option.costCents,
    // After conversion a saving can round to 0: only a raise saving at least one minor unit is reported.
    raised:
      option.quote.qty > option.plain.qty && plainCents > option.costCents
        ? {
            plainQty: option.plain.qty,
            extraQty: option.quote.qty - option.plain.qty,
            plainCostCents: plainCents,
            savingCents: plainCents - option.costCents,
          }
        : null,
  };
}

function stageSubtotals(project: Project, lines: LineContext[], costLines: CostLine[]): StageSubtotal[] {
  const groups: StageSubtotal[] = [
    ...project.stages.map((s) => ({
      stageId: s.id as string | null,
      name: s.name,
      kind: s.kind,
      lineIds: [] as string[],
      partsCents: 0,
    })),
    { stageId: null, name: GENERAL_STAGE_NAME, kind: null, lineIds: [], partsCents: 0 },
  ];
  lines.forEach((l, i) => {
    const g = groups.find((x) => x.stageId === (l.stage?.id ?? null)) ?? groups[groups.length - 1];
    g.lineIds.push(l.lineId);
    g.partsCents += costLines[i].lineCostCents;
  });
  return groups.filter((g) => g.lineIds.length > 0);
}

function singleComparison(
  input: PlanInput,
  purchasable: number,
  planTotal: number,
  unpriced: number,
): SingleSupplierComparison {
  if (purchasable === 0) return { available: false, reason: 'No line has a usable priced offer.' };
  const single = planSingleSupplier(input);
  if (single === null) {
    return {
      available: false,
      reason: 'No single supplier offers every priced line; the parts must come from several suppliers.',
    };
  }
  const s = single.used[0];
  return {
    available: true,
    supplier: input.suppliers[s],
    partsCents: single.partsCents,
    shippingCents: single.shippingCents,
    totalCents: single.totalCents,
    extraCents: single.totalCents - planTotal,
    unpricedLines: unpriced,
  };
}
