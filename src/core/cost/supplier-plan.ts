// Supplier choice: which supplier each purchasable line is bought from so that parts plus shipping
// (paid once per supplier used) is least. This is the uncapacitated facility-location problem
// (suppliers = facilities with an opening cost, lines = customers); it is NP-hard in general, so:
// - up to `exactLimit` suppliers: enumerate every non-empty supplier subset; with the subset fixed each
//   line takes its cheapest supplier in it. Exact: the optimum uses some subset, and for that subset
//   per-line minima are optimal.
// - beyond: branch and bound over open / closed decisions per supplier (bound below), started from the
//   local-search plan. Exact when it finishes within `nodeLimit` nodes; otherwise the best plan found is
//   returned with a proven lower bound (the least bound of the nodes left unexplored).
// Local search (single add / drop / swap moves, best improvement first) from three starts (all suppliers;
// each line's cheapest supplier; the best single supplier) gives the starting plan.
// The line costs given here are already each line's least cost per supplier over its allowed order
// quantities (line-options.ts), so supplier and quantity are chosen together.

export interface PlanInput {
  /** Supplier names, index = column of lineCosts. */
  suppliers: readonly string[];
  /** Shipping per supplier, project-currency minor units. */
  shippingCents: readonly number[];
  /** [line][supplier] cheapest line cost in project-currency minor units; Infinity = not offered. */
  lineCosts: readonly (readonly number[])[];
}

export interface PlanResult {
  /** Supplier index per line. */
  assignment: number[];
  /** Indices of suppliers actually used, ascending. */
  used: number[];
  partsCents: number;
  shippingCents: number;
  totalCents: number;
}

export type PlanMethod = 'exact' | 'branch-and-bound' | 'local-search';

export const DEFAULT_EXACT_LIMIT = 12;
/** Subset masks are 32-bit integers (1 << n), and 2^24 subsets is already minutes of work. */
export const MAX_EXACT_LIMIT = 24;

/** Cost of buying every line from the cheapest supplier in `open`; null when a line is not covered. */
export function evaluateSubset(input: PlanInput, open: readonly boolean[]): PlanResult | null {
  const openList: number[] = [];
  for (let s = 0; s < open.length; s++) if (open[s]) openList.push(s);
  const assignment: number[] = [];
  let parts = 0;
  for (const row of input.lineCosts) {
    let best = -1;
    for (const s of openList) {
      if (Number.isFinite(row[s]) && (best < 0 || row[s] < row[best])) best = s;
    }
    if (best < 0) return null;
    assignment.push(best);
    parts += row[best];
  }
  const used = [...new Set(assignment)].sort((a, b) => a - b);
  const shipping = used.reduce((sum, s) => sum + input.shippingCents[s], 0);
  return { assignment, used, partsCents: parts, shippingCents: shipping, totalCents: parts + shipping };
}

/** Deterministic order: lower total, then fewer suppliers, then earlier supplier indices. */
function better(a: PlanResult, b: PlanResult | null): boolean {
  if (b === null) return true;
  if (a.totalCents !== b.totalCents) return a.totalCents < b.totalCents;
  if (a.used.length !== b.used.length) return a.used.length < b.used.length;
  for (let i = 0; i < a.used.length; i++) if (a.used[i] !== b.used[i]) return a.used[i] < b.used[i];
  return false;
}

const EMPTY: PlanResult = { assignment: [], used: [], partsCents: 0, shippingCents: 0, totalCents: 0 };

/** Exact optimum by subset enumeration (2^n subsets). null when some line has no supplier at all. */
export function planExact(input: PlanInput): PlanResult | null {
  const n = input.suppliers.length;
  if (input.lineCosts.length === 0) return EMPTY;
  let best: PlanResult | null = null;
  for (let mask = 1; mask < 1 << n; mask++) {
    const open = Array.from({ length: n }, (_, s) => (mask & (1 << s)) !== 0);
    const r = evaluateSubset(input, open);
    if (r !== null && better(r, best)) best = r;
  }
  return best;
}

function localSearchFrom(input: PlanInput, start: boolean[]): PlanResult | null {
  let open = start.slice();
  let current = evaluateSubset(input, open);
  if (current === null) return null;
  const n = open.length;
  // Each accepted move strictly lowers the total (or the tie order), so the loop ends; the cap is a guard.
  for (let iter = 0; iter < 10_000; iter++) {
    let bestMove: { open: boolean[]; result: PlanResult } | null = null;
    const consider = (cand: boolean[]) => {
      const r = evaluateSubset(input, cand);
      if (r !== null && better(r, bestMove ? bestMove.result : current)) bestMove = { open: cand, result: r };
    };
    for (let s = 0; s < n; s++) {
      const flip = open.slice();
      flip[s] = !flip[s];
      consider(flip); // add or drop
      if (!open[s]) continue;
      for (let t = 0; t < n; t++) {
        if (open[t]) continue;
        const swap = open.slice();
        swap[s] = false;
        swap[t] = true;
        consider(swap);
      }
    }
    if (bestMove === null) break;
    const move: { open: boolean[]; result: PlanResult } = bestMove;
    open = move.open;
    current = move.result;
  }
  return current;
}

/** Heuristic plan by local search; never worse than the best single supplier or the cheapest-per-line plan. */
export function planLocalSearch(input: PlanInput): PlanResult | null {
  const n = input.suppliers.length;
  if (input.lineCosts.length === 0) return EMPTY;
  const starts: boolean[][] = [Array(n).fill(true)];
  const cheapest = evaluateSubset(input, Array(n).fill(true));
  if (cheapest !== null) starts.push(Array.from({ length: n }, (_, s) => cheapest.used.includes(s)));
  const single = planSingleSupplier(input);
  if (single !== null) starts.push(Array.from({ length: n }, (_, s) => s === single.used[0]));
  let best: PlanResult | null = null;
  for (const st of starts) {
    const r = localSearchFrom(input, st);
    if (r !== null && better(r, best)) best = r;
  }
  return best;
}

/** Cheapest plan using one supplier for every line; null when no supplier offers every line. */
export function planSingleSupplier(input: PlanInput): PlanResult | null {
  let best: PlanResult | null = null;
  for (let s = 0; s < input.suppliers.length; s++) {
    const r = evaluateSubset(input, input.suppliers.map((_, t) => t === s));
    if (r !== null && better(r, best)) best = r;
  }
  return best;
}

export const DEFAULT_NODE_LIMIT = 200_000;

export interface BoundResult {
  plan: PlanResult | null;
  /** True when every node was explored or pruned: the plan is optimal. */
  proven: boolean;
  /** No plan costs less than this (equals plan.totalCents when proven); null when nothing is purchasable. */
  lowerBoundCents: number | null;
  nodes: number;
}

interface BbNode {
  /** Decision per supplier for indices < depth: true open, false closed; undecided from depth on. */
  open: boolean[];
  depth: number;
  bound: number;
}

/**
 * Lower bound of every plan whose open suppliers include the ones opened so far and exclude the ones closed:
 * each line at its cheapest among open-or-undecided suppliers, plus shipping of the suppliers opened so far.
 * Valid because adding suppliers never raises a line's cost and shipping is never negative.
 * Infinity when some line has no open-or-undecided supplier.
 */
function nodeBound(input: PlanInput, open: readonly boolean[], depth: number): number {
  let total = 0;
  for (let s = 0; s < depth; s++) if (open[s]) total += input.shippingCents[s];
  for (const row of input.lineCosts) {
    let best = Infinity;
    for (let s = 0; s < row.length; s++) if ((s >= depth || open[s]) && row[s] < best) best = row[s];
    if (best === Infinity) return Infinity;
    total += best;
  }
  return total;
}

/** Branch and bound (depth first, open before closed), started from the local-search plan. */
export function planBranchAndBound(input: PlanInput, nodeLimit: number = DEFAULT_NODE_LIMIT): BoundResult {
  const n = input.suppliers.length;
  if (input.lineCosts.length === 0) return { plan: EMPTY, proven: true, lowerBoundCents: 0, nodes: 0 };
  let best = planLocalSearch(input);
  if (best === null) return { plan: null, proven: true, lowerBoundCents: null, nodes: 0 };
  const stack: BbNode[] = [{ open: Array(n).fill(false), depth: 0, bound: nodeBound(input, [], 0) }];
  let nodes = 0;
  while (stack.length > 0) {
    if (nodes >= nodeLimit) {
      const lb = Math.min(best.totalCents, ...stack.map((x) => x.bound));
      return { plan: best, proven: false, lowerBoundCents: lb, nodes };
    }
    const node = stack.pop() as BbNode;
    nodes++;
    // Strictly greater: an equal bound may still hold a plan that wins the tie order.
    if (node.bound > best.totalCents) continue;
    if (node.depth === n) {
      const r = evaluateSubset(input, node.open);
      if (r !== null && better(r, best)) best = r;
      continue;
    }
    for (const choice of [false, true]) {
      const open = node.open.slice();
      open[node.depth] = choice;
      const bound = nodeBound(input, open, node.depth + 1);
      if (bound <= best.totalCents) stack.push({ open, depth: node.depth + 1, bound });
    }
  }
  return { plan: best, proven: true, lowerBoundCents: best.totalCents, nodes };
}

export interface PlanChoice {
  method: PlanMethod;
  plan: PlanResult | null;
  /** Proven least total (exact or finished branch and bound). */
  proven: boolean;
  /** No plan can cost less than this; null when nothing is purchasable. */
  lowerBoundCents: number | null;
  /** Supplier combinations compared (exact) or search nodes visited (branch and bound). */
  examined: number;
}

/**
 * Exhaustive when the supplier count is within `exactLimit`, otherwise branch and bound with `nodeLimit`
 * nodes; says which ran, whether the plan is proven least, and a lower bound when it is not.
 */
export function choosePlan(
  input: PlanInput,
  exactLimit: number = DEFAULT_EXACT_LIMIT,
  nodeLimit: number = DEFAULT_NODE_LIMIT,
): PlanChoice {
  const n = input.suppliers.length;
  if (n <= Math.min(exactLimit, MAX_EXACT_LIMIT)) {
    const plan = planExact(input);
    return { method: 'exact', plan, proven: true, lowerBoundCents: plan?.totalCents ?? null, examined: 2 ** n - 1 };
  }
  const r = planBranchAndBound(input, nodeLimit);
  return {
    method: r.proven ? 'branch-and-bound' : 'local-search',
    plan: r.plan,
    proven: r.proven,
    lowerBoundCents: r.lowerBoundCents,
    examined: r.nodes,
  };
}
