/**
 * An independent check of the plate coefficients: the series (Lévy) solution of a rectangular
 * plate whose two vertical edges are simply supported, loaded by water pressure that falls
 * linearly from q at the bottom to zero at the top (Timoshenko & Woinowsky-Krieger, "Theory of
 * Plates and Shells", 2nd ed., §§27–30, Lévy's method with a single-series particular solution).
 *
 * Plate 0 ≤ x ≤ L (horizontal), 0 ≤ y ≤ H (bottom to top), D = 1, q = 1:
 *   w = Σ w_m(y)·sin(α x), α = mπ/L, m odd, load term q_m(y) = 4/(mπ)·(1 − y/H),
 *   w_m = particular q_m/α⁴ + (A + B y)e^{−αy} + (C + E (y−H))e^{α(y−H)}.
 * Bottom (y = 0) simply supported: w = 0, w'' = 0. Top (y = H) free: M_y = 0 and the Kirchhoff
 * edge force V_y = 0, i.e. w'' − ν α² w = 0 and w''' − (2 − ν) α² w' = 0; or, braced, w = 0, w'' = 0.
 * Moments M_x = −(w_xx + ν w_yy), M_y = −(w_yy + ν w_xx), M_xy = (1 − ν) w_xy; the peak principal
 * moment over a grid gives β = 6·M_max / (q·b²).
 */

type Top = "free" | "braced";

function solve4(a: number[][], r: number[]): number[] {
  const m = a.map((row, i) => [...row, r[i]]);
  for (let c = 0; c < 4; c++) {
    let p = c;
    for (let i = c + 1; i < 4; i++) if (Math.abs(m[i][c]) > Math.abs(m[p][c])) p = i;
    [m[c], m[p]] = [m[p], m[c]];
    for (let i = 0; i < 4; i++) {
      if (i === c) continue;
      const f = m[i][c] / m[c][c];
      for (let k = c; k < 5; k++) m[i][k] -= f * m[c][k];
    }
  }
  return m.map((row, i) => row[4] / row[i]);
}

/** Peak principal bending moment per unit q (D = 1), for a plate L long and H high. */
export function peakMoment(L: number, H: number, top: Top, nu = 0.3, terms = 81, grid = 61): number {
  const xs = Array.from({ length: grid }, (_, i) => (L * i) / (grid - 1));
  const ys = Array.from({ length: grid }, (_, i) => (H * i) / (grid - 1));
  const mx = xs.map(() => ys.map(() => 0));
  const my = xs.map(() => ys.map(() => 0));
  const mxy = xs.map(() => ys.map(() => 0));
  for (let m = 1; m <= terms; m += 2) {
    const al = (m * Math.PI) / L;
    const qm = 4 / (m * Math.PI);
    // Basis e^{s·α·(y − shift)}·(1 or (y − shift)); nth derivative in y.
    const basis: Array<[s: number, shift: number, linear: number]> = [
      [-1, 0, 0],
      [-1, 0, 1],
      [1, H, 0],
      [1, H, 1],
    ];
    const d = (n: number, y: number, [s, sh, r]: [number, number, number]) => {
      const yy = y - sh;
      const e = Math.exp(s * al * yy);
      const p = r ? 0 : 1;
      return e * ((s * al) ** n * (p + r * yy) + (n > 0 ? n * (s * al) ** (n - 1) * r : 0));
    };
    const dp = (n: number, y: number) => (n === 0 ? (qm * (1 - y / H)) / al ** 4 : n === 1 ? -qm / H / al ** 4 : 0);
    const rows: number[][] = [];
    const rhs: number[] = [];
    rows.push(basis.map((b) => d(0, 0, b)));
    rhs.push(-dp(0, 0));
    rows.push(basis.map((b) => d(2, 0, b)));
    rhs.push(-dp(2, 0));
    if (top === "free") {
      rows.push(basis.map((b) => d(2, H, b) - nu * al ** 2 * d(0, H, b)));
      rhs.push(-(dp(2, H) - nu * al ** 2 * dp(0, H)));
      rows.push(basis.map((b) => d(3, H, b) - (2 - nu) * al ** 2 * d(1, H, b)));
      rhs.push(-(dp(3, H) - (2 - nu) * al ** 2 * dp(1, H)));
    } else {
      rows.push(basis.map((b) => d(0, H, b)));
      rhs.push(-dp(0, H));
      rows.push(basis.map((b) => d(2, H, b)));
      rhs.push(-dp(2, H));
    }
    const c = solve4(rows, rhs);
    ys.forEach((y, j) => {
      const w0 = c.reduce((acc, ci, k) => acc + ci * d(0, y, basis[k]), 0) + dp(0, y);
      const w1 = c.reduce((acc, ci, k) => acc + ci * d(1, y, basis[k]), 0) + dp(1, y);
      const w2 = c.reduce((acc, ci, k) => acc + ci * d(2, y, basis[k]), 0) + dp(2, y);
      xs.forEach((x, i) => {
        const S = Math.sin(al * x);
        mx[i][j] += -(-(al ** 2) * w0 + nu * w2) * S;
        my[i][j] += -(w2 - nu * al ** 2 * w0) * S;
        mxy[i][j] += (1 - nu) * al * w1 * Math.cos(al * x);
      });
    });
  }
  let peak = 0;
  for (let i = 0; i < grid; i++)
    for (let j = 0; j < grid; j++) {
      const avg = (mx[i][j] + my[i][j]) / 2;
      const half = (mx[i][j] - my[i][j]) / 2;
      peak = Math.max(peak, Math.abs(avg) + Math.sqrt(half * half + mxy[i][j] ** 2));
    }
  return peak;
}

/** β in σ = β·q·b²/t² from the series, for the given b. */
export function seriesBeta(L: number, H: number, top: Top, b: number): number {
  return (6 * peakMoment(L, H, top)) / (b * b);
}
