// The supply section of the build checklist: first power-up and the expected rail voltages. Pure.
import type { BatteryRail, Project, RectifiedRail } from '../model';
import type { ChecklistItem, ChecklistReport, ChecklistSection } from './types';
import { step, caution, measured, fmt } from './items';
import { railNominalV } from '../budget';

export function supplySection(project: Project, report: ChecklistReport): ChecklistSection {
  const items = project.mains ? mainsItems(project, report) : batteryItems(project, report);
  return {
    id: 'supply',
    title: project.mains ? 'Power supply (mains)' : 'Power supply (battery)',
    stageId: null,
    items,
  };
}

function mainsItems(project: Project, report: ChecklistReport): ChecklistItem[] {
  const items: ChecklistItem[] = [
    caution(
      'Wire the inlet, fuse, switch and transformer primary first, with the secondaries unloaded, and insulate every ' +
        'mains terminal before power is applied.',
    ),
    // Common practice, no published source: a lamp in series with the primary limits the fault current
    caution(
      'First power-up through a series lamp (a 40–60 W incandescent bulb in series with the primary) or a ' +
        'current-limited variable transformer; a lamp glowing steadily bright means a fault.',
    ),
  ];
  const supply = report.supply;
  for (const rail of project.supply.rails) {
    if (rail.kind === 'rectified') {
      const r = supply?.rails.find((x) => x.railId === rail.id);
      if (r && r.kind === 'rectified') {
        const nl = r.corners.find((c) => c.id === 'nominal-receive') ?? r.corners[0];
        const kd = r.corners.find((c) => c.id === 'low-keyDown');
        items.push(
          measured(
            `${rail.name}: with no load at nominal mains expect about {v}.`,
            nl?.noLoadPeakV ?? null,
            'V',
            `supply: ${nl?.label ?? 'no load'}`,
          ),
        );
        if (kd)
          items.push(
            measured(
              `${rail.name}: lowest point of the ripple at low mains, key-down, about ` +
                `{v}${needText(project, rail, r.requiredMinV)}.`,
              kd.troughV,
              'V',
              `supply: ${kd.label}`,
              kd.headroomMarginV < 0 ? 'caution' : 'normal',
            ),
          );
        const wf = r.windingFuse;
        if (wf?.fuse.ratedA != null || wf?.fittedA != null) {
          const a = wf.fittedA ?? wf.fuse.ratedA!;
          items.push(
            caution(
              `${wf.windingName}: the ${wf.fittedA !== null ? 'fitted' : 'recommended'} ` +
                `${a < 1 ? `${Math.round(a * 1000)} mA` : `${a} A`} fuse goes in the winding lead between the ` +
                `transformer and the rectifier, so a shorted bridge or reservoir blows it; a fuse after the ` +
                `reservoir protects only the wiring beyond it.`,
            ),
          );
        }
        if (r.bleeder.fittedTimeS !== null)
          items.push(
            measured(
              `Switch off and time the discharge: ${rail.name} should fall below ${fmt(r.bleeder.safeV, 'V')}` +
                ` within about {v}.`,
              r.bleeder.fittedTimeS,
              's',
              'supply: bleeder',
            ),
          );
      } else {
        items.push(
          measured(
            `${rail.name}: expect roughly {v} (supply design not computed).`,
            railNominalV(rail, project),
            'V',
            'budget: nominal rail voltage',
          ),
        );
      }
    } else if (rail.kind === 'regulated') {
      const r = supply?.rails.find((x) => x.railId === rail.id);
      const v = r && r.kind === 'regulated' ? r.outputV : railNominalV(rail, project);
      items.push(
        measured(
          `${rail.name}: set or check the regulator output, {v}, before connecting any stage.`,
          v,
          'V',
          r ? 'supply: regulator setting' : 'budget: regulator setting',
        ),
      );
    }
  }
  items.push(
    step(
      'Load each rail with a power resistor drawing about its key-down current for a minute; voltages must hold and ' +
        'nothing may run hot.',
    ),
  );
  return items;
}

function batteryItems(project: Project, report: ChecklistReport): ChecklistItem[] {
  const items: ChecklistItem[] = [
    caution('Fit the battery fuse at the battery terminal end of the positive lead before anything else is connected.'),
    caution(
      'Check the polarity of every power lead with a meter before the first connection; fit the reverse-polarity ' +
        'protection first.',
    ),
    step(
      'First power-up from a current-limited bench supply set to the battery voltage instead of the battery itself.',
    ),
  ];
  for (const rail of project.supply.rails) {
    const r = report.supply?.rails.find((x) => x.railId === rail.id);
    if (rail.kind === 'battery') {
      items.push(
        measured(
          `${rail.name}: a full battery reads up to {v}; stop operating at ${fmt(rail.endV, 'V')}.`,
          rail.fullV,
          'V',
          'project: battery',
        ),
      );
      if (r && r.kind === 'battery')
        items.push(
          measured(
            `${rail.name}: at end of discharge, key-down, the rig sees about ` +
              `{v}${needText(project, rail, r.requiredMinV)}.`,
            r.loadedEndV,
            'V',
            'supply: battery end voltage under load',
            r.loadedEndV < r.requiredMinV ? 'caution' : 'normal',
          ),
        );
    } else if (rail.kind === 'regulated') {
      const v = r && r.kind === 'regulated' ? r.outputV : railNominalV(rail, project);
      items.push(
        measured(
          `${rail.name}: check the regulator output, {v}, before connecting any stage.`,
          v,
          'V',
          r ? 'supply: regulator setting' : 'budget: regulator setting',
        ),
      );
    }
  }
  return items;
}

/**
 * What the rail must stay above, in words: the regulators' need or the lowest voltage stated for its direct loads
 * (the supply design's requirement, whichever is higher), or that none is stated, so the reading has nothing to be
 * compared with. A margin alone is not a need: it is not shown as one.
 */
function needText(project: Project, rail: RectifiedRail | BatteryRail, requiredMinV: number): string {
  const feedsRegulator = project.supply.rails.some((x) => x.kind === 'regulated' && x.parentId === rail.id);
  if (rail.minimumV === null && !feedsRegulator)
    return ' (no lowest voltage is stated for its loads: state one on the supply page to have it checked)';
  const who = rail.minimumV !== null && requiredMinV === rail.minimumV ? 'its loads' : 'the regulators it feeds';
  return ` (must stay above ${fmt(requiredMinV, 'V')}, the least ${who} need)`;
}
