// A design role: a part the computed design needs (the transformer, a rail's reservoir, the PA devices...), with the
// ratings it requires. A parts-list line is bound to a role by its roleId; the bound part is checked rule by rule.
import type { SourceKey } from '../sources/registry';
import type { PartCategory } from '../spec/parts-categories';

/**
 * One rating the role requires. 'min': the part's rating must be at least `limit` (below `hardLimit`, when given,
 * is a fail, between the two a caution); 'max': at most `limit`; 'near': within `tolerance` (fraction) of `limit`;
 * 'oneOf': a text rating from `options`; 'eachOf': a grouped role (fuses, bleeders, filter capacitors) needs several
 * values, each line's part must be within `tolerance` of one of them, and the bound lines together must cover each
 * value's count (pieces per rig). `cover` on 'oneOf' asks the same of text options (fuse types per position).
 */
export interface GroupValue<T> {
  value: T;
  /** Pieces per rig the design needs of this value. */
  count: number;
  /** Where they go, for messages ("primary, PA rail output"). */
  where: string;
  /** Text ratings the same part must also have for this value (a fuse position's type: { type: 'T' }). */
  with?: Readonly<Record<string, string>>;
}

export type RoleRule =
  | {
      key: string;
      label: string;
      unit: string;
      op: 'min' | 'max';
      limit: number;
      hardLimit?: number;
      required: boolean;
      source: SourceKey;
      why: string;
    }
  | {
      key: string;
      label: string;
      unit: string;
      op: 'near';
      limit: number;
      tolerance: number;
      required: boolean;
      source: SourceKey;
      why: string;
    }
  | {
      key: string;
      label: string;
      unit: '';
      op: 'oneOf';
      options: readonly string[];
      cover?: readonly GroupValue<string>[];
      required: boolean;
      source: SourceKey;
      why: string;
    }
  | {
      key: string;
      label: string;
      unit: string;
      op: 'eachOf';
      values: readonly GroupValue<number>[];
      tolerance: number;
      required: boolean;
      source: SourceKey;
      why: string;
    };

export interface DesignRole {
  /** Stable id from the design's own ids, e.g. "reservoir:rail-pa", "pa-devices:st-pa". */
  id: string;
  /** Words for pages, e.g. "Reservoir capacitor, PA rail". */
  label: string;
  category: PartCategory;
  /** Stage a new line for this role goes on (null = general). */
  stageId: string | null;
  /** Pieces per rig a new line for this role starts with. */
  qtyPerRig: number;
  /** The requirement in one line for the builder, e.g. "≥ 6800 µF, ≥ 40.3 V, ≥ 1.9 A ripple". */
  requirement: string;
  rules: RoleRule[];
}

/** A bound part against its role, rule by rule. */
export interface RoleStatus {
  role: DesignRole;
  /** Parts-list lines bound to this role (normally one). */
  lineIds: string[];
  /** 'ok' every required rating met; 'fail' a rating falls short or the category is wrong; 'unbound' no line. */
  state: 'ok' | 'caution' | 'fail' | 'unbound';
  /** The bound lines with their parts (absent in statuses made before this field). */
  bound?: { lineId: string; refs: string; qtyPerRig: number; partId: string; part: string }[];
  /** Why the state is not ok: the messages of the role's caution and fail findings, most severe first. */
  problems?: string[];
}
