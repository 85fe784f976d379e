// The parts the computed design needs, each with its requirement, read from the supply and RF reports.
// Pure: the same project and reports give the same roles, with ids made from the design's own ids.
import type { Project } from '../model';
import type { SupplyReport, RectifiedRailReport, RegulatedRailReport } from '../power/report-types';
import type { RfReport } from '../rf/report';
import { NO_HEATSINK_NEEDED_K_PER_W } from '../rf/pa-thermal';
import { BLEEDER_DERATING } from '../power/bleeder';
import { CAP_VOLTAGE_MARGIN } from '../power/reservoir';
import { railEstimateV } from '../role-defaults';
import { formatValue } from '../units';
import type { DesignRole, RoleRule } from './types';
import { finite, groupValues, role } from './role-make';
import { filterRoles } from './filter-roles';
import { findCore } from '../rf/core-catalog';

/** Capacitance may be this much under the design's value (nominal values compared). Common practice, no source. */
export const CAPACITANCE_SLACK = 0.02;
/** A winding's rated voltage within this fraction of the one designed with. Common practice, no published source. */
export const WINDING_V_TOLERANCE = 0.05;
/** A relay coil's rated voltage within this fraction of its rail's. Common practice, no published source. */
export const COIL_V_TOLERANCE = 0.1;

const f = (v: number, unit: string) => formatValue(v, unit);

function transformerRoles(project: Project, supply: SupplyReport): DesignRole[] {
  return supply.transformers.map((t) => {
    const model = project.supply.transformers.find((x) => x.id === t.transformerId);
    // Source: the simulated thermal VA (supply.transformer-current), against the maker's VA rating
    const rules: RoleRule[] = [
      {
        key: 'va',
        label: 'VA',
        unit: 'VA',
        op: 'min',
        limit: t.thermalVA,
        required: true,
        source: 'supply.transformer-current',
        why: 'the windings’ heating-equivalent VA at the CW duty',
      },
    ];
    (model?.windings ?? []).forEach((w, i) => {
      const rec = t.windings.find((x) => x.windingId === w.id);
      rules.push({
        key: `sec${i + 1}V`,
        label: `${w.name} volts`,
        unit: 'V',
        op: 'near',
        limit: w.ratedVrms,
        tolerance: WINDING_V_TOLERANCE,
        required: true,
        source: 'roles.winding-voltage',
        why: 'the rails were designed with this winding voltage',
      });
      if (rec && finite(rec.ratedA))
        rules.push({
          key: `sec${i + 1}A`,
          label: `${w.name} current`,
          unit: 'A',
          op: 'min',
          limit: rec.ratedA,
          required: true,
          source: 'supply.transformer-current',
          why: 'the winding’s heating-equivalent RMS current',
        });
    });
    return role(`transformer:${t.transformerId}`, `Mains transformer ${t.name}`, 'transformer', null, 1, rules);
  });
}

function reservoirRole(r: RectifiedRailReport): DesignRole {
  const res = r.reservoir;
  const rules: RoleRule[] = [
    {
      key: 'capacitanceF',
      label: 'Capacitance',
      unit: 'F',
      op: 'min',
      limit: res.fittedF * (1 - CAPACITANCE_SLACK),
      required: true,
      source: 'supply.reservoir-plan',
      why: 'the capacitance the rail was simulated with',
    },
    // Source: no-load high-mains peak with the 20 % margin (supply.capacitor-voltage), fail below the peak itself
    {
      key: 'voltageV',
      label: 'Voltage',
      unit: 'V',
      op: 'min',
      limit: res.noLoadPeakHighV * CAP_VOLTAGE_MARGIN,
      hardLimit: res.noLoadPeakHighV,
      required: true,
      source: 'supply.capacitor-voltage',
      why: 'the no-load peak at high mains with margin',
    },
    {
      key: 'rippleA',
      label: 'Ripple',
      unit: 'A',
      op: 'min',
      limit: res.thermalRippleA,
      required: true,
      source: 'supply.capacitor-ripple',
      why: 'the simulated RMS ripple current at the CW duty',
    },
  ];
  return role(`reservoir:${r.railId}`, `Reservoir capacitor, ${r.railName}`, 'capacitor', null, 1, rules);
}

function regulatorRoles(project: Project, r: RegulatedRailReport): DesignRole[] {
  const model = project.supply.rails.find((x) => x.id === r.railId);
  const mount = model?.kind === 'regulated' ? model.mount : null;
  const maxA = Math.max(0, ...r.corners.map((c) => c.outputA).filter(Number.isFinite));
  const rules: RoleRule[] = [
    {
      key: 'dropoutV',
      label: 'Dropout',
      unit: 'V',
      op: 'max',
      limit: r.dropoutV,
      required: true,
      source: 'supply.regulator-dropout',
      why: 'the headroom the rail was designed with',
    },
    {
      key: 'maxCurrentA',
      label: 'Current',
      unit: 'A',
      op: 'min',
      limit: maxA,
      required: true,
      source: 'design.maker-rating',
      why: 'the highest output current of any corner',
    },
  ];
  if (mount)
    rules.push({
      key: 'thetaJcKPerW',
      label: 'θjc',
      unit: 'K/W',
      op: 'max',
      limit: mount.thetaJcKPerW,
      required: true,
      source: 'thermal.series-path',
      why: 'the θjc the heating was computed with',
    });
  const out = [role(`regulator:${r.railId}`, `Regulator, ${r.railName}`, 'regulator', null, 1, rules)];
  const need = r.thermal?.needsHeatsink ? r.thermal.requiredThetaSaKPerW : null;
  if (finite(need))
    out.push(
      role(`heatsink:${r.railId}`, `Regulator heatsink, ${r.railName}`, 'heatsink', null, 1, [
        {
          key: 'thetaSaKPerW',
          label: 'θsa',
          unit: 'K/W',
          op: 'max',
          limit: need,
          required: true,
          source: 'thermal.series-path',
          why: 'the largest θsa keeping the junction at 0.8 Tj,max',
        },
      ]),
    );
  return out;
}

/**
 * Every fuse of the supply as one role: one fuse type, positions and ratings listed (one line, values per position).
 */
function fuseRole(supply: SupplyReport, project: Project): DesignRole | null {
  const positions: { where: string; ratedA: number | null; type: 'T' | 'F' }[] = [];
  if (supply.primary)
    positions.push({
      where: 'primary',
      ratedA: supply.primary.fittedA ?? supply.primary.fuse.ratedA,
      type: supply.primary.fuse.characteristic,
    });
  for (const r of supply.rails) {
    if (r.kind === 'regulated') continue;
    const model = project.supply.rails.find((x) => x.id === r.railId);
    const fitted = model && model.kind === 'rectified' ? model.fuseA : null;
    positions.push({ where: `${r.railName} output`, ratedA: fitted ?? r.fuse.ratedA, type: r.fuse.characteristic });
  }
  if (!positions.length) return null;
  const types = groupValues(positions.map((p) => ({ value: p.type, where: p.where })));
  // each position's rating with its type: a 2.5 A fuse of the wrong characteristic does not fill a 2.5 A T position
  const ratings = groupValues(
    positions
      .filter((p) => finite(p.ratedA))
      .map((p) => ({ value: p.ratedA as number, where: p.where, with: { type: p.type } })),
  );
  const rules: RoleRule[] = [
    {
      key: 'type',
      label: 'Type',
      unit: '',
      op: 'oneOf',
      options: types.map((t) => t.value),
      cover: types,
      required: true,
      source: 'supply.fuse',
      why:
        types.length > 1
          ? 'positions need different types: one line per type'
          : 'the characteristic every position needs',
    },
  ];
  // one line per rating: each bound fuse must have one of the positions' ratings, and together they cover each
  if (ratings.length)
    rules.push({
      key: 'ratedA',
      label: 'Rating',
      unit: 'A',
      op: 'eachOf',
      values: ratings,
      tolerance: 0.001,
      required: false,
      source: 'supply.fuse',
      why: 'the rating of a position',
    });
  const where = positions
    .map((p) => `${p.where} ${p.ratedA === null ? 'beyond the series' : f(p.ratedA, 'A')} ${p.type}`)
    .join(', ');
  return role('fuses', 'Fuses', 'fuse', null, positions.length, rules, `positions: ${where}`);
}

/** The bleeders of all rectified rails as one role (one resistor value across rails, or the requirement says not). */
function bleederRole(supply: SupplyReport): DesignRole | null {
  const rails = supply.rails.filter(
    (r): r is RectifiedRailReport => r.kind === 'rectified' && r.bleeder.fittedOhm !== null,
  );
  if (!rails.length) return null;
  const ohms = groupValues(rails.map((r) => ({ value: r.bleeder.fittedOhm as number, where: r.railName })));
  const maxW = Math.max(...rails.map((r) => r.bleeder.fittedW ?? 0));
  const rules: RoleRule[] = [];
  // each bound resistor has one rail's value, and together they cover every rail
  rules.push({
    key: 'resistanceOhm',
    label: 'Resistance',
    unit: 'Ω',
    op: 'eachOf',
    values: ohms,
    tolerance: 0.05,
    required: true,
    source: 'supply.bleeder',
    why: 'the bleeder the discharge time was computed with',
  });
  // Source: P = V²/R at the high-mains peak, rated at most 50 % loaded (supply.bleeder-power)
  if (maxW > 0)
    rules.push({
      key: 'powerW',
      label: 'Power',
      unit: 'W',
      op: 'min',
      limit: maxW / BLEEDER_DERATING,
      hardLimit: maxW,
      required: true,
      source: 'supply.bleeder-power',
      why: 'the dissipation at the no-load peak, derated',
    });
  return role(
    'bleeders',
    'Bleeder resistors',
    'resistor',
    null,
    rails.length,
    rules,
    ohms.length > 1 ? 'rails use different values: one line per value' : '',
  );
}

function rfRoles(project: Project, rf: RfReport): DesignRole[] {
  const out: DesignRole[] = [];
  for (const s of rf.stages) {
    const stage = project.stages.find((x) => x.id === s.stageId);
    if (s.pa && !s.pa.refused && stage?.pa) {
      const pa = s.pa;
      const rules: RoleRule[] = [
        {
          key: 'vdsMaxV',
          label: 'V(BR)DSS',
          unit: 'V',
          op: 'min',
          limit: pa.peakDrainV,
          required: true,
          source: 'pa.vds',
          why: 'the peak drain voltage at the highest supply voltage',
        },
        {
          key: 'idMaxA',
          label: 'Drain current',
          unit: 'A',
          op: 'min',
          limit: pa.peakDeviceA,
          required: true,
          source: 'pa.peak-current',
          why: 'the peak current of one conducting device',
        },
      ];
      if (finite(stage.pa.rdsOnOhm))
        rules.push({
          key: 'rdsOnOhm',
          label: 'Rds(on)',
          unit: 'Ω',
          op: 'max',
          limit: stage.pa.rdsOnOhm,
          required: true,
          source: 'pa.load-line',
          why: 'the Rds(on) the output was computed with',
        });
      out.push(
        role(`pa-devices:${s.stageId}`, `PA devices, ${s.stageName}`, 'mosfet', s.stageId, stage.pa.devices, rules),
      );
      const need = pa.thermal.thetaSaNeededAverageKPerW;
      if (finite(need) && need < NO_HEATSINK_NEEDED_K_PER_W)
        out.push(
          role(`pa-heatsink:${s.stageId}`, `PA heatsink, ${s.stageName}`, 'heatsink', s.stageId, 1, [
            {
              key: 'thetaSaKPerW',
              label: 'θsa',
              unit: 'K/W',
              op: 'max',
              limit: need,
              required: true,
              source: 'pa.thermal',
              why: 'the largest θsa keeping the junctions at 0.8 Tj,max',
            },
          ]),
        );
    }
    if (stage) out.push(...filterRoles(stage, s, rf.frequencyHz, findCore(project, stage.lpf?.coreId)));
    if (s.relay && stage?.relay) {
      const rl = s.relay;
      const coilRail = project.supply.rails.find((r) => r.id === stage.relay?.coilRailId);
      const coilV = coilRail ? railEstimateV(coilRail, project) : NaN;
      const rules: RoleRule[] = [
        {
          key: 'contactCarryA',
          label: 'Contact current',
          unit: 'A',
          op: 'min',
          limit: rl.rfRmsA,
          required: true,
          source: 'line.standing-wave',
          why: 'the RF current maximum at the worst SWR',
        },
        {
          key: 'contactV',
          label: 'Contact voltage',
          unit: 'V',
          op: 'min',
          limit: rl.rfPeakV,
          required: false,
          source: 'line.standing-wave',
          why: 'the RF peak voltage at the worst SWR',
        },
        {
          key: 'coilA',
          label: 'Coil current',
          unit: 'A',
          op: 'max',
          limit: stage.relay.coilA,
          required: true,
          source: 'roles.relay-coil',
          why: 'the coil current the budget carries',
        },
      ];
      if (finite(coilV))
        rules.push({
          key: 'coilV',
          label: 'Coil voltage',
          unit: 'V',
          op: 'near',
          limit: coilV,
          tolerance: COIL_V_TOLERANCE,
          required: false,
          source: 'roles.relay-coil',
          why: 'the voltage of the coil’s rail',
        });
      out.push(role(`relay:${s.stageId}`, `T/R relay, ${s.stageName}`, 'relay', s.stageId, 1, rules));
    }
  }
  return out;
}

/** The roles of the design: supply parts when the supply is designed, RF parts from the RF report. */
export function designRoles(project: Project, supply: SupplyReport | null, rf: RfReport): DesignRole[] {
  const out: DesignRole[] = [];
  if (supply) {
    out.push(...transformerRoles(project, supply));
    for (const r of supply.rails) {
      if (r.kind === 'rectified') out.push(reservoirRole(r));
      if (r.kind === 'regulated') out.push(...regulatorRoles(project, r));
    }
    const fuses = fuseRole(supply, project);
    if (fuses) out.push(fuses);
    const bleeders = bleederRole(supply);
    if (bleeders) out.push(bleeders);
  }
  out.push(...rfRoles(project, rf));
  return out;
}
