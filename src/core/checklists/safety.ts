// Safety checklist: mains or battery, stored charge, heat, RF exposure and the licence, from the report's
// numbers and findings. Pure. The usual cautions; local codes, licence conditions and licensed practice win.
import type { Project } from '../model';
import type { ChecklistItem, ChecklistReport, ChecklistSection } from './types';
import { actionable, sortFindings, standingCautions } from '../findings';
import { sourceText } from '../sources/registry';
import { step, caution, measured, fmt } from './items';
import { rfView } from './rf-view';
import { quotient } from '../numeric';

export const SAFETY_PREAMBLE =
  'This list is a planning aid, not a certification. Local electrical codes, your licence conditions and the ' +
    'practice of a licensed electrician or a qualified person take precedence over anything here.';

export function safetyChecklist(project: Project, report: ChecklistReport): ChecklistSection[] {
  const sections: ChecklistSection[] = [
    { id: 'safety:general', title: 'Before you start', stageId: null, items: generalItems() },
  ];
  sections.push(
    project.mains
      ? { id: 'safety:mains', title: 'Mains wiring', stageId: null, items: mainsItems(project, report) }
      : { id: 'safety:battery', title: 'Battery and DC wiring', stageId: null, items: batteryItems(project, report) },
  );
  sections.push({ id: 'safety:heat', title: 'Heat', stageId: null, items: heatItems(report) });
  sections.push({
    id: 'safety:rf',
    title: 'Transmitting and RF exposure',
    stageId: null,
    items: rfItems(project, report),
  });
  const open = sortFindings(actionable(report.findings)).filter((f) => f.severity !== 'ok');
  if (open.length > 0) {
    sections.push({
      id: 'safety:findings',
      title: 'Open findings to resolve before power-up',
      stageId: null,
      items: open.map((f) => ({
        text: `${f.severity === 'fail' ? 'FAIL' : 'Caution'} — ${withSubject(f.subject, f.message)}`,
        value: f.value,
        unit: f.unit,
        basis: `finding: ${f.rule}`,
        emphasis: 'caution' as const,
      })),
    });
  }
  const standing = standingCautions(report.findings);
  if (standing.length > 0) {
    sections.push({
      id: 'safety:standing',
      title: 'Standing cautions (true of every station of this kind)',
      stageId: null,
      items: standing.map((f) => caution(`${withSubject(f.subject, f.message)} (Source: ${sourceText(f.source)})`)),
    });
  }
  return sections;
}

const fuseKind = (c: 'T' | 'F') => (c === 'T' ? 'time-lag (T)' : 'quick-acting (F)');

/** "subject: message", unless the message already starts with the subject. */
export function withSubject(subject: string, message: string): string {
  return message.startsWith(subject) ? message : `${subject}: ${message}`;
}

function generalItems(): ChecklistItem[] {
  return [
    caution(SAFETY_PREAMBLE),
    step(
      'Work with one hand where anything may be live, on a dry bench, with the rig unplugged whenever you solder or ' +
        'change wiring.',
    ),
  ];
}

function mainsItems(project: Project, report: ChecklistReport): ChecklistItem[] {
  const supply = report.supply;
  const items: ChecklistItem[] = [
    caution('Use a fused, switched and earthed mains inlet; the switch and fuse break the live (phase) conductor.'),
    caution(
      'Bond the protective earth to the chassis at its own fixing (star washer, locking nut, no other part under ' +
        'it), and keep the earth lead longer than live and neutral so it is the last to pull out.',
    ),
    caution('If in doubt about any mains work, have it done or inspected by a qualified person before first use.'),
    step('Measure the resistance from the inlet earth pin to bare chassis metal: a fraction of an ohm.'),
    caution(
      'Sleeve or shroud every mains terminal (inlet, switch, fuse holder, transformer primary); no bare mains ' +
        'conductor may be touchable with the lid off.',
    ),
  ];
  const pf = supply?.primary?.fuse;
  if (pf && pf.ratedA === null)
    items.push(
      caution(
        `Primary fuse: the load (${fmt(pf.loadA, 'A')}) is beyond the standard fuse series; review the design before ` +
          `building.`,
        pf.loadA,
        'A',
        'supply: primary fuse',
      ),
    );
  else if (pf)
    items.push(
      measured(
        `Primary fuse: ${fuseKind(pf.characteristic)} {v} (load ${fmt(pf.loadA, 'A')}).`,
        pf.ratedA,
        'A',
        'supply: primary fuse',
        'caution',
      ),
    );
  else items.push(step('Primary fuse: not computed; size it from the transformer rating before first use.'));
  for (const r of supply?.rails ?? []) {
    if (r.kind !== 'rectified') continue;
    if (r.fuse.ratedA === null)
      items.push(
        caution(
          `${r.railName} fuse: the load (${fmt(r.fuse.loadA, 'A')}) is beyond the standard fuse series; review the ` +
            `design.`,
          r.fuse.loadA,
          'A',
          'supply: rail fuse',
        ),
      );
    else
      items.push(
        measured(
          `${r.railName} fuse: ${fuseKind(r.fuse.characteristic)} {v}.`,
          r.fuse.ratedA,
          'A',
          'supply: rail fuse',
        ),
      );
    const rated = project.supply.rails.find((x) => x.id === r.railId);
    const fittedV = rated && rated.kind === 'rectified' ? rated.capacitorRatedV : null;
    items.push(
      measured(
        `${r.railName} reservoir: rated at least {v} (no-load peak at high mains ` +
          `${fmt(r.reservoir.noLoadPeakHighV, 'V')}${fittedV ? `, fitted ${fmt(fittedV, 'V')}` : ''}).`,
        r.reservoir.recommendedRatedV,
        'V',
        'supply: reservoir rating',
        fittedV !== null && r.reservoir.recommendedRatedV !== null && fittedV < r.reservoir.recommendedRatedV
          ? 'caution'
          : 'normal',
      ),
    );
    if (r.bleeder.fittedOhm !== null && r.bleeder.fittedTimeS === 0)
      items.push(
        measured(
          `${r.railName}: the rail starts below ${fmt(r.bleeder.safeV, 'V')}; the fitted {v} bleeder still drains ` +
            `the reservoir after switch-off.`,
          r.bleeder.fittedOhm,
          'Ω',
          'supply: bleeder',
        ),
      );
    else if (r.bleeder.fittedTimeS !== null)
      items.push(
        measured(
          `${r.railName}: the bleeder brings the reservoir below ${fmt(r.bleeder.safeV, 'V')} in about ` +
            `{v}${r.bleeder.startV > r.bleeder.thresholdV ? ` (allowed ${fmt(r.bleeder.allowedS, 's')})` : ''}` +
            `; wait that long after switch-off.`,
          r.bleeder.fittedTimeS,
          's',
          'supply: bleeder',
          r.bleeder.startV > r.bleeder.thresholdV && r.bleeder.fittedTimeS > r.bleeder.allowedS ? 'caution' : 'normal',
        ),
      );
    else
      items.push(
        measured(
          `${r.railName}: no bleeder fitted; fit about {v} so the reservoir discharges after switch-off.`,
          r.bleeder.suggestedOhm,
          'Ω',
          'supply: bleeder',
          'caution',
        ),
      );
    items.push(
      measured(
        `${r.railName}: a charged reservoir can deliver about {v} into a short; discharge it through a resistor, ` +
          `never a screwdriver.`,
        r.bleeder.shortCircuitA,
        'A',
        'supply: stored charge',
        'caution',
      ),
    );
  }
  return items;
}

function batteryItems(project: Project, report: ChecklistReport): ChecklistItem[] {
  const items: ChecklistItem[] = [];
  for (const rail of project.supply.rails) {
    if (rail.kind !== 'battery') continue;
    const r = report.supply?.rails.find((x) => x.railId === rail.id);
    if (r && r.kind === 'battery' && r.fuse.ratedA !== null)
      items.push(
        measured(
          `Fuse the positive lead at the battery terminal: ${fuseKind(r.fuse.characteristic)} {v}.`,
          r.fuse.ratedA,
          'A',
          'supply: battery fuse',
          'caution',
        ),
      );
    else items.push(caution('Fuse the positive lead at the battery terminal (fuse value not computed).'));
    // Ohm's law: short-circuit current limited by the internal resistance only
    // null (shown as not known) below 1 µΩ: a subnormal resistance passed `> 0` and gave an infinite current
    const shortA = quotient(rail.fullV, rail.internalOhm, 1e-6);
    items.push(
      measured(
        `A dead short across ${rail.name} can draw about {v}: insulate the terminals and carry the battery with its ` +
          `leads covered.`,
        shortA,
        'A',
        'project: full voltage / internal resistance',
        'caution',
      ),
    );
    items.push(
      caution(
        `Charge the ${rail.chemistry} battery only with a charger made for that chemistry, on a non-flammable ` +
          `surface, and never unattended; do not charge a swollen or damaged pack.`,
      ),
    );
  }
  items.push(
    caution(
      'Fit reverse-polarity protection (series diode, fuse-and-shunt-diode or a MOSFET) and use a polarised ' +
        'connector for the power lead.',
    ),
  );
  return items;
}

function heatItems(report: ChecklistReport): ChecklistItem[] {
  const items: ChecklistItem[] = [];
  for (const r of report.supply?.rails ?? []) {
    if (r.kind !== 'regulated' || !r.thermal) continue;
    const t = r.thermal;
    if (t.junctionC !== null)
      items.push(
        measured(
          `${r.railName} regulator junction about {v} at the thermal load (target below ${fmt(t.targetC, '°C')}).`,
          t.junctionC,
          '°C',
          'supply: regulator thermal',
          t.junctionC > t.targetC ? 'caution' : 'normal',
        ),
      );
    else if (t.needsHeatsink)
      items.push(
        measured(
          `${r.railName} regulator needs a heatsink of at most {v}.`,
          t.requiredThetaSaKPerW,
          'K/W',
          'supply: regulator thermal',
          'caution',
        ),
      );
  }
  const rf = rfView(report.rf);
  if (rf?.paJunctionC != null)
    items.push(
      measured(
        'PA junction about {v} during continuous key-down with the fitted heatsink.',
        rf.paJunctionC,
        '°C',
        'rf: PA thermal',
      ),
    );
  if (rf?.paThetaSaNeededKPerW != null)
    items.push(
      measured(
        'PA heatsink: at most {v} for continuous key-down (tune-up).',
        rf.paThetaSaNeededKPerW,
        'K/W',
        'rf: PA thermal',
      ),
    );
  items.push(
    caution(
      'Heatsinks of the final and regulators can burn; use insulating washers where the tab is live and keep the ' +
        'ventilation clear.',
    ),
  );
  return items;
}

function rfItems(project: Project, report: ChecklistReport): ChecklistItem[] {
  const rf = rfView(report.rf);
  const items: ChecklistItem[] = [
    caution(
      'Transmit only if you hold an amateur licence that allows it, on frequencies and powers your licence permits; ' +
        'tests on the bench go into a dummy load.',
    ),
    measured(
      'Rated output for the licence check: {v}.',
      rf?.paOutputW ?? project.targetPowerW,
      'W',
      rf?.paOutputW != null ? 'rf: PA output' : 'project: target power',
    ),
  ];
  if (rf && rf.exposure.length > 0) {
    for (const e of rf.exposure)
      items.push(
        measured(
          `Keep people at least {v} from the antenna (${e.label}).`,
          e.distanceM,
          'm',
          'rf: exposure estimate',
          'caution',
        ),
      );
  } else items.push(step('RF exposure distances: not computed; assess them before operating into an antenna.'));
  items.push(
    caution(
      'The exposure figures are estimates; your national exposure rules and the station assessment your licence ' +
        'requires take precedence.',
    ),
  );
  items.push(
    step('Never touch the antenna, the PA output or the filter while transmitting: RF burns are deep and painful.'),
  );
  return items;
}
