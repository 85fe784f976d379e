// The power the filter's and relay's parts are judged at: the most the PA stage can deliver as built.
import type { Worst } from './pa-swr';

export interface StressPower {
  /** Forward power from the PA the part stress is computed for, W. */
  powerW: number;
  /**
   * Where it comes from: 'saturated' = the stage driven into hard saturation into its design load at the highest
   * key-down supply; 'swr-circle' = the most the stage gives round the worst-SWR circle; 'design' = the design drive's
   * output at the highest key-down supply (neither source gives more, or neither is known).
   */
  basis: 'saturated' | 'swr-circle' | 'design';
  /** The circle's reflection phase of that most (null: the antenna at its design load, or not on the circle). */
  phaseDeg: number | null;
  /** Short words for a message or heading: "8.62 W, the most the stage gives round the SWR 2 circle (phase 90°)". */
  text: string;
}

export interface StressSources {
  /** The design drive's output at the highest key-down supply (high mains, full battery), W. */
  hotDesignW: number;
  /** The design drive's output at the design supply and the waveform band's most there (saturated drive), W. */
  designW: number | null;
  bandMaxW: number | null;
  /** The most round the worst-SWR circle (already at the highest key-down supply), and the SWR. */
  circleMax: Worst | null;
  swr: number;
  /** Battery-fed rail (wording). */
  battery: boolean;
  /** The PA's waveform model (wording of the saturated end). */
  model?: string | null;
}

const ok = (x: number | null | undefined): x is number => typeof x === 'number' && Number.isFinite(x) && x > 0;
const w = (x: number) => `${x.toPrecision(3)} W`;

const bandEnd = (model: string | null | undefined) =>
  model === 'cosine-pulse' ? 'driven into hard saturation'
    : model === 'class-e-simulated' ? "at its series network's lowest loaded Q"
      : 'at the worst end of its waveform band';

/**
 * The larger of the saturated-drive output into the design load at the highest supply and the most round the circle.
 * Saturated output at the highest supply: the band's power ratio to the design point applied to the hot output
 * (both outputs of one waveform scale with the supply squared: P = V² / 2R for a load line; pa-dc bandFigures
 * scales every band point from the design output the same way).
 * The stress at each load then takes this power (a bound: the most power at the load that stresses the part most).
 * Common practice, no published source (worst-case design).
 */
export function stressPower(s: StressSources): StressPower {
  const supply = s.battery ? 'a full battery' : 'high mains';
  const satW = ok(s.designW) && ok(s.bandMaxW) && ok(s.hotDesignW) ? (s.bandMaxW / s.designW) * s.hotDesignW : null;
  const circleW = s.circleMax && s.swr > 1 && ok(s.circleMax.value) ? s.circleMax.value : null;
  const hot = ok(s.hotDesignW) ? s.hotDesignW : 0;
  const best = Math.max(hot, satW ?? 0, circleW ?? 0);
  if (circleW !== null && circleW >= best && circleW > hot * 1.001) {
    const ph = s.circleMax!.phaseDeg;
    const where = ph === null ? 'with the antenna at its design load' : `(phase ${ph.toFixed(0)}°)`;
    return {
      powerW: circleW, basis: 'swr-circle', phaseDeg: ph,
      text: `${w(circleW)}, the most the stage gives round the SWR ${s.swr} circle ${where}`,
    };
  }
  if (satW !== null && satW >= best && satW > hot * 1.001) {
    return {
      powerW: satW, basis: 'saturated', phaseDeg: null,
      text: `${w(satW)}, the stage's output ${bandEnd(s.model)} (design load, ${supply})`,
    };
  }
  return { powerW: hot, basis: 'design', phaseDeg: null, text: `${w(hot)}, the PA's output at ${supply}` };
}

/** One line for the page and pack: the power the filter's parts are checked at ('' when not known). */
export function partsPowerLine(basis: { parts: StressPower | null } | undefined): string {
  if (!basis) return '';
  return basis.parts
    ? `Power: ${basis.parts.text}, taken at each part's worst load on the circle (a bound).`
    : 'Power: the target power (no PA stage is computed).';
}

/** The relay's power in words: the parts' power, less the filter's loss when the relay follows the filter. */
export function relayPowerLine(basis: { parts: StressPower | null } | undefined, afterFilter: boolean): string {
  if (!basis) return '';
  const less = afterFilter ? ' less the filter\'s loss' : '';
  return basis.parts ? `${basis.parts.text}${less}` : `the target power${less} (no PA stage is computed)`;
}
