// Build checklist: one section per stage in build order, generated from the stage kinds and the report's
// numbers. Pure. Wording is our own; the order follows common bench practice (supply first, the final
// amplifier last, always into a dummy load through the filter).
import type { Project, Stage, StageKind } from '../model';
import type { ChecklistItem, ChecklistReport, ChecklistSection } from './types';
import { step, caution, measured, stageCurrents, stagePerMode, fmt } from './items';
import { supplySection } from './build-supply';
import { rfView, type RfView } from './rf-view';
import { CONSTRUCTION_FLOOR_DBC } from '../rf/harmonics';

// Common practice, no published source: build and test the supply, then the receive chain, then the
// transmit chain from the oscillator towards the antenna, with the final amplifier last.
const BUILD_ORDER: StageKind[] = ['receiver', 'vxo', 'other', 'tr', 'driver', 'lpf', 'final'];

export function stagesInBuildOrder(project: Project): Stage[] {
  return BUILD_ORDER.flatMap((k) => project.stages.filter((s) => s.kind === k));
}

export function buildChecklist(project: Project, report: ChecklistReport): ChecklistSection[] {
  const rf = rfView(report.rf);
  const sections: ChecklistSection[] = [supplySection(project, report)];
  for (const stage of stagesInBuildOrder(project)) {
    const items = [...kindItems(project, report, stage, rf), ...currentItems(report, stage)];
    sections.push({ id: `stage:${stage.id}`, title: stage.name, stageId: stage.id, items });
  }
  sections.push({ id: 'station', title: 'Whole station', stageId: null, items: stationItems(report, rf) });
  return sections;
}

function currentItems(report: ChecklistReport, stage: Stage): ChecklistItem[] {
  const items: ChecklistItem[] = [];
  const mode = stage.kind === 'receiver' || stage.kind === 'vxo' || stage.kind === 'other' ? 'receive' : 'keyUp';
  const modeWords = mode === 'receive' ? 'in receive' : 'with the key up (transmit selected)';
  for (const c of stageCurrents(report, stage.id, mode)) {
    if (stage.kind === 'final') continue; // the final's idle and key-down currents have their own lines
    items.push(
      measured(
        `With the stage fitted, the ${c.railName} current rises by about {v} ${modeWords}; much more means a fault: ` +
          `switch off and look.`,
        c.currentA,
        'A',
        `budget: ${stage.name}, ${mode}`,
      ),
    );
  }
  if (stage.kind === 'driver') {
    for (const c of stageCurrents(report, stage.id, 'keyDown'))
      items.push(
        measured(
          `Key-down, the driver draws about {v} from ${c.railName}.`,
          c.currentA,
          'A',
          `budget: ${stage.name}, key-down`,
        ),
      );
  }
  return items;
}

function kindItems(project: Project, report: ChecklistReport, stage: Stage, rf: RfView | null): ChecklistItem[] {
  switch (stage.kind) {
    case 'receiver':
      return [
        step(
          'Inspect the board for solder bridges and the orientation of ICs, diodes and electrolytics before the ' +
            'first power-up.',
        ),
        step(
          'Power the receiver alone through a current-limited supply; confirm audio hiss in the phones before ' +
            'fitting the oscillator.',
        ),
      ];
    case 'vxo':
      return [
        step(
          'Confirm the oscillator starts every time from cold, across the whole tuning range, on a frequency counter ' +
            'or a calibrated receiver.',
        ),
        measured(
          'Check the tuning range covers the operating frequency {v}.',
          project.frequencyHz,
          'Hz',
          'project: operating frequency',
        ),
        step(
          'Let it run 15 minutes and note the drift; rework thermal coupling if it wanders by more than a few tens ' +
            'of hertz per minute.',
        ),
      ];
    case 'tr':
      return trItems(stage, rf);
    case 'driver':
      return [
        step(
          'Terminate the driver output in a resistor of its design load (or fit the final with its bias at minimum) ' +
            'before keying.',
        ),
      ];
    case 'lpf':
      return lpfItems(project, rf);
    case 'final':
      return finalItems(project, report, stage, rf);
    default:
      return [step('Check the stage works on its own before connecting it to the rest of the rig.')];
  }
}

function trItems(stage: Stage, rf: RfView | null): ChecklistItem[] {
  const r = stage.relay;
  const items: ChecklistItem[] = [
    step('Key the rig with the final unpowered and listen for the relay; confirm the receiver mutes and recovers.'),
  ];
  if (!r) return items;
  const settleS = r.operateS + r.bounceS;
  const marginS = rf?.relayMarginS ?? r.txDelayS - settleS;
  items.push(
    measured(
      'Relay operate time plus bounce is {v}; on a scope, the contacts must settle before RF appears.',
      settleS,
      's',
      'stage: relay operate + bounce',
    ),
  );
  items.push(
    measured(
      `Transmit delay after the relay is keyed is {v}, ${fmt(marginS, 's')} ${marginS < 0 ? 'SHORT of' : 'beyond'}` +
        ` the settle time above.`,
      r.txDelayS,
      's',
      rf?.relayMarginS != null ? 'rf: T/R timing' : 'stage: T/R delay',
      marginS < 0 ? 'caution' : 'normal',
    ),
  );
  items.push(
    measured(
      'Relay release time {v}: no RF may reach the receiver while the contacts open.',
      r.releaseS,
      's',
      'stage: relay release',
    ),
  );
  return items;
}

function lpfItems(project: Project, rf: RfView | null): ChecklistItem[] {
  const items: ChecklistItem[] = [];
  if (rf && rf.lpfElements.length > 0) {
    for (const e of rf.lpfElements) {
      const unit = e.kind === 'capacitor' ? 'F' : 'H';
      const how =
        e.kind === 'capacitor'
          ? `fit ${e.partsText}`
          : `wind ${e.partsText}${rf.lpfCoreName ? ` on the ${rf.lpfCoreName}` : ''}`;
      items.push(
        measured(
          `${e.label}: ${how}, giving {v} (ideal ${fmt(e.idealValue, unit)}).`,
          e.builtValue,
          unit,
          'rf: filter design',
        ),
      );
    }
    items.push(measured('Cutoff of the design: {v}.', rf.lpfCutoffHz, 'Hz', 'rf: filter design'));
  } else {
    items.push(step('Filter values: not computed; take them from the RF design before winding.'));
  }
  items.push(
    step(
      'Wind the toroids evenly over about 300° of the core; count a turn each time the wire passes through the hole.',
    ),
  );
  items.push(
    measured(
      'Sweep the filter between 50 Ω terminations (or with a noise source and receiver): low loss at {v}, steep ' +
        'fall above the cutoff.',
      project.frequencyHz,
      'Hz',
      'project: operating frequency',
    ),
  );
  if (rf?.lpfBandLossDb !== null && rf?.lpfBandLossDb !== undefined)
    items.push(
      measured('Expected worst insertion loss across the band: {v}.', rf.lpfBandLossDb, 'dB', 'rf: filter analysis'),
    );
  for (const h of rf?.harmonics ?? []) {
    items.push(
      measured(
        `Attenuation at harmonic ${h.n} (${fmt(h.frequencyHz, 'Hz')}) should be about {v}; squeeze or spread turns ` +
          `if it is well short.`,
        h.filterAttenuationDb,
        'dB',
        'rf: filter analysis',
      ),
    );
  }
  return items;
}

function finalItems(project: Project, report: ChecklistReport, stage: Stage, rf: RfView | null): ChecklistItem[] {
  const pa = stage.pa;
  const biased = !pa || pa.biasIdleMaxA > 0;
  const items: ChecklistItem[] = [
    caution(
      'Connect a 50 Ω dummy load rated for the full output through the low-pass filter before any key-down; never ' +
        'key into an open or unknown antenna.',
    ),
  ];
  if (biased) items.push(caution('Set the bias preset to minimum (no gate bias) before the first key-down.'));
  items.push(
    step(
      project.mains
        ? 'Power the PA rail through a current limit or a series lamp for the first key-down.'
        : 'Power the PA from a current-limited bench supply for the first key-down, not straight from the battery.',
    ),
  );
  if (pa) {
    const perMode = stagePerMode(report, stage.id, pa.railId);
    if (biased) {
      items.push(
        measured(
          'Raise the bias slowly, key up, until the idle current reaches {v}; do not exceed it.',
          perMode?.keyUp ?? null,
          'A',
          'budget: final, key-up idle',
        ),
      );
      items.push(
        measured(
          'The bias preset at its maximum can give up to {v}: leave it at the setting above.',
          pa.biasIdleMaxA,
          'A',
          'stage: bias idle maximum',
          'caution',
        ),
      );
    } else {
      items.push(
        measured(
          `This class ${pa.amplifierClass} final runs without idle bias: key up, its rail current should be about {v}.`,
          perMode?.keyUp ?? null,
          'A',
          'budget: final, key-up',
        ),
      );
    }
    // measured at the design drive; the budget's figure (hard saturation) is the most it may draw
    const kdA = rf?.paDesignKeyDownA ?? perMode?.keyDown ?? null;
    const satA = rf?.paKeyDownA ?? null;
    const sat = satA !== null && kdA !== null && satA > kdA * 1.05
      ? ` Driven into hard saturation it can draw up to ${fmt(satA, 'A')}, what the supply is sized for.` : '';
    items.push(
      measured(
        `Key down for a few seconds at the design drive: PA rail current about {v}.${sat}`,
        kdA,
        'A',
        rf?.paDesignKeyDownA != null ? 'rf: PA key-down current at the design drive' : 'budget: final, key-down',
      ),
    );
  }
  const outW = rf?.paOutputW ?? null;
  items.push(
    measured(
      outW === null
        ? 'Measure the output into the dummy load (PA not computed; target {v}).'
        : 'Measure the output into the dummy load: expect about {v}.',
      outW ?? project.targetPowerW,
      'W',
      outW === null ? 'project: target power' : 'rf: PA output',
    ),
  );
  if (rf?.paJunctionC != null)
    items.push(
      measured(
        'After a minute of continuous key-down the heatsink must stay comfortable to touch; predicted junction {v}.',
        rf.paJunctionC,
        '°C',
        'rf: PA thermal',
      ),
    );
  else
    items.push(
      step('After a minute of key-down, feel the heatsink (power off first): it must not be too hot to hold.'),
    );
  return items;
}

function stationItems(report: ChecklistReport, rf: RfView | null): ChecklistItem[] {
  const items: ChecklistItem[] = [];
  for (const rail of report.supply?.rails ?? []) {
    if (rail.kind !== 'rectified') continue;
    const kd = rail.corners.find((c) => c.id === 'nominal-keyDown');
    if (kd)
      items.push(
        measured(
          `${rail.railName} key-down at nominal mains: about {v}, ripple ${fmt(kd.ripplePpV, 'V')} p-p.`,
          kd.dcMeanV,
          'V',
          `supply: ${kd.label}`,
        ),
      );
  }
  for (const h of rf?.harmonics ?? []) {
    const emphasis = h.severity === 'ok' ? 'normal' : 'caution';
    // below the construction floor the build, not the filter, sets the level: no number is printed
    if (h.predictedDbc < CONSTRUCTION_FLOOR_DBC) {
      items.push({
        text: `Harmonic ${h.n}: limited by construction at the antenna (the prediction lies below ` +
          `${CONSTRUCTION_FLOOR_DBC} dBc), ${fmt(h.requiredDb, 'dB')} required below the carrier.`,
        value: null,
        unit: '',
        basis: 'rf: harmonics',
        emphasis,
      });
    } else {
      items.push(
        measured(
          `Harmonic ${h.n}: predicted {v} at the antenna, ${fmt(h.requiredDb, 'dB')} required below the carrier.`,
          h.predictedDbc,
          'dBc',
          'rf: harmonics',
          emphasis,
        ),
      );
    }
  }
  if (!rf)
    items.push(step('RF results not computed: check output power and harmonics against the RF page when available.'));
  items.push(
    step(
      'Final check: receive and transmit on the dummy load, the full keying speed, for ten minutes; nothing smells, ' +
        'nothing drifts.',
    ),
  );
  return items;
}
