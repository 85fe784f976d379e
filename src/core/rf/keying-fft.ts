// Radix-2 fast Fourier transform of a complex sequence (pure, no allocation beyond the output arrays).
// Source: J. W. Cooley and J. W. Tukey, "An algorithm for the machine calculation of complex Fourier series",
// Math. Comp. 19 (1965), pp. 297–301: iterative decimation in time after a bit-reversal permutation.

export interface Complex {
  re: number[];
  im: number[];
}

/** True for a positive integer power of two. */
export const isPowerOfTwo = (n: number): boolean => Number.isInteger(n) && n > 0 && (n & (n - 1)) === 0;

/**
 * Forward DFT X[k] = Σ x[n] e^(−j2πkn/N) of a real or complex sequence whose length is a power of two.
 * Throws for another length (a programmer error: callers choose the record length).
 */
export function fft(re: readonly number[], im: readonly number[] = []): Complex {
  const n = re.length;
  if (!isPowerOfTwo(n)) throw new Error(`fft: length ${n} is not a power of two`);
  const xr = re.slice();
  const xi = im.length === n ? im.slice() : new Array<number>(n).fill(0);
  // bit-reversal permutation
  for (let i = 1, j = 0; i < n; i++) {
    let bit = n >> 1;
    for (; j & bit; bit >>= 1) j ^= bit;
    j ^= bit;
    if (i < j) {
      [xr[i], xr[j]] = [xr[j], xr[i]];
      [xi[i], xi[j]] = [xi[j], xi[i]];
    }
  }
  for (let len = 2; len <= n; len <<= 1) {
    // Source: Cooley and Tukey (1965): butterfly with twiddle factor W = e^(−j2π/len)
    const ang = (-2 * Math.PI) / len;
    const wr = Math.cos(ang);
    const wi = Math.sin(ang);
    for (let i = 0; i < n; i += len) {
      let cr = 1;
      let ci = 0;
      for (let k = 0; k < len / 2; k++) {
        const a = i + k;
        const b = a + len / 2;
        const tr = xr[b] * cr - xi[b] * ci;
        const ti = xr[b] * ci + xi[b] * cr;
        xr[b] = xr[a] - tr;
        xi[b] = xi[a] - ti;
        xr[a] += tr;
        xi[a] += ti;
        const nr = cr * wr - ci * wi;
        ci = cr * wi + ci * wr;
        cr = nr;
      }
    }
  }
  return { re: xr, im: xi };
}
