// The edits the settings forms make: pure, the parsed (SI) values in, the changed project out.
import type { Project, RfSettings } from '../model';
import type { ProjectSettings } from '../spec/settings';

/** The overview's settings form: the project's own values and its mains (null for a battery / DC station). */
export const applySettings = (p: Project, s: ProjectSettings): Project => ({
  ...p,
  name: s.name,
  notes: s.notes,
  frequencyHz: s.frequencyHz,
  targetPowerW: s.targetPowerW,
  mains: s.mains,
  ambientC: s.ambientC,
  keyingDuty: s.keyingDuty,
  kits: s.kits,
  currency: s.currency,
});

/** The RF page's settings form. */
export const applyRfSettings = (p: Project, rf: RfSettings): Project => ({ ...p, rf });
