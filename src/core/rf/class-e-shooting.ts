// The class-E stage's periodic state for one switching pattern (class-e-sim.ts): a cycle is a product of its
// steps' pieces, each exact over its step, so the cycle maps the state affinely, x → Φ x (the last state is the
// constant 1, which carries the supply and the affine part). Its fixed point solves (I − A) y = b with A the first
// four rows and columns of Φ and b the first four entries of its last column (shooting method for periodic steady
// states: Aprille and Trick, Proc. IEEE 60(1), 1972, from memory). Used only as a start: the simulation then runs
// cycles from it to its own stopping rule.

const N = 5;

/** a · b for flat row-major 5 × 5 matrices. */
function mul(a: Float64Array, b: Float64Array): Float64Array {
  const c = new Float64Array(N * N);
  for (let i = 0; i < N; i++) {
    for (let k = 0; k < N; k++) {
      const aik = a[i * N + k];
      if (aik !== 0) for (let j = 0; j < N; j++) c[i * N + j] += aik * b[k * N + j];
    }
  }
  return c;
}

/** P^n by repeated squaring, the squares kept in `pows` (P, P², P⁴, ...). */
function power(pows: Float64Array[], n: number): Float64Array {
  let out: Float64Array | null = null;
  for (let j = 0; n > 0; j++, n >>= 1) {
    if (j >= pows.length) pows.push(mul(pows[j - 1], pows[j - 1]));
    if (n & 1) out = out ? mul(pows[j], out) : pows[j];
  }
  return out ?? identity();
}

function identity(): Float64Array {
  const m = new Float64Array(N * N);
  for (let i = 0; i < N; i++) m[i * N + i] = 1;
  return m;
}

/** The two pieces and their squares found so far (P, P², P⁴, ...), kept across the tries of one simulation. */
export interface Pieces {
  on: Float64Array[];
  off: Float64Array[];
}

/** Pieces for periodicStateFor: `on` conducting (switch or body diode), `off` open, each over one step. */
export const piecesOf = (on: Float64Array, off: Float64Array): Pieces => ({ on: [on], off: [off] });

/**
 * The cycle start the cycle maps to itself, for the pattern (1 = the conducting piece `on` at that step, 0 = `off`);
 * null when the system has no unique solution or the result is not finite.
 */
export function periodicStateFor(pieces: Pieces, pattern: Uint8Array): Float64Array | null {
  const pows = [pieces.on, pieces.off];
  let phi = identity();
  for (let k = 0; k < pattern.length;) {
    let e = k;
    while (e < pattern.length && pattern[e] === pattern[k]) e++;
    // later steps multiply from the left: x_end = P_last ··· P_first x_start
    phi = mul(power(pattern[k] ? pows[0] : pows[1], e - k), phi);
    k = e;
  }
  // Source: Gaussian elimination with partial pivoting on (I − A) y = b (textbook linear algebra)
  const m = 4;
  const a = Array.from({ length: m }, (_, i) =>
    Array.from({ length: m + 1 }, (_, j) => (j === m ? phi[i * N + 4] : (i === j ? 1 : 0) - phi[i * N + j])));
  for (let c = 0; c < m; c++) {
    let p = c;
    for (let r = c + 1; r < m; r++) if (Math.abs(a[r][c]) > Math.abs(a[p][c])) p = r;
    if (!(Math.abs(a[p][c]) > 1e-300)) return null;
    [a[c], a[p]] = [a[p], a[c]];
    for (let r = c + 1; r < m; r++) {
      const f = a[r][c] / a[c][c];
      for (let j = c; j <= m; j++) a[r][j] -= f * a[c][j];
    }
  }
  const y = new Float64Array(N);
  y[4] = 1;
  for (let i = m - 1; i >= 0; i--) {
    let s = a[i][m];
    for (let j = i + 1; j < m; j++) s -= a[i][j] * y[j];
    y[i] = s / a[i][i];
  }
  return y.every(Number.isFinite) ? y : null;
}
