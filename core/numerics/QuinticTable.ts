/**
 * Piecewise quintic Hermite interpolant on a uniform grid: on each panel the unique degree-5
 * polynomial matching value, first and second derivative at both ends (C² overall). Its error is
 * h⁶ max|f⁽⁶⁾| / 46080 at worst (the Hermite remainder f⁽⁶⁾(ξ)/6! · (x−x₀)³(x−x₁)³).
 * Internal helper of the core; coefficients are stored in the power basis of t ∈ [0, 1].
 */
export class QuinticTable {
  /** First grid point. */
  readonly x0: number;
  /** Grid spacing. */
  readonly h: number;
  /** Number of panels (one fewer than nodes). */
  readonly panels: number;
  /** Last grid point, x0 + panels × h. */
  readonly xEnd: number;
  private readonly invH: number;
  private readonly c: Float64Array;
  private readonly last: number;

  /**
   * @param x0 first grid point
   * @param h grid spacing (> 0)
   * @param f values at the n ≥ 2 nodes
   * @param df first derivatives df/dx at the nodes
   * @param d2f second derivatives d²f/dx² at the nodes
   */
  constructor(x0: number, h: number, f: ArrayLike<number>, df: ArrayLike<number>, d2f: ArrayLike<number>) {
    const n = f.length - 1;
    this.x0 = x0;
    this.h = h;
    this.panels = n;
    this.xEnd = x0 + n * h;
    this.invH = 1 / h;
    const c = new Float64Array(6 * n);
    for (let i = 0; i < n; i++) {
      const p0 = f[i];
      const p1 = f[i + 1];
      const m0 = h * df[i];
      const m1 = h * df[i + 1];
      const c0 = h * h * d2f[i];
      const c1 = h * h * d2f[i + 1];
      const d = p1 - p0;
      const k = 6 * i;
      c[k] = p0;
      c[k + 1] = m0;
      c[k + 2] = 0.5 * c0;
      c[k + 3] = 10 * d - 6 * m0 - 4 * m1 - 0.5 * (3 * c0 - c1);
      c[k + 4] = -15 * d + 8 * m0 + 7 * m1 + 0.5 * (3 * c0 - 2 * c1);
      c[k + 5] = 6 * d - 3 * (m0 + m1) - 0.5 * (c0 - c1);
    }
    this.c = c;
    this.last = f[n];
  }

  /** Interpolated value at x ∈ [x0, xEnd] (the caller keeps x in range). */
  value(x: number): number {
    const s = (x - this.x0) * this.invH;
    let i = s | 0; // s ≥ 0 in range, so truncation is floor
    if (i >= this.panels) i = this.panels - 1;
    else if (i < 0) i = 0;
    const t = s - i;
    const c = this.c;
    const k = 6 * i;
    return c[k] + t * (c[k + 1] + t * (c[k + 2] + t * (c[k + 3] + t * (c[k + 4] + t * c[k + 5]))));
  }

  /** Derivative of the interpolant, d/dx, at x ∈ [x0, xEnd]. */
  derivative(x: number): number {
    const s = (x - this.x0) * this.invH;
    let i = Math.floor(s);
    if (i >= this.panels) i = this.panels - 1;
    else if (i < 0) i = 0;
    const t = s - i;
    const c = this.c;
    const k = 6 * i;
    return (c[k + 1] + t * (2 * c[k + 2] + t * (3 * c[k + 3] + t * (4 * c[k + 4] + t * 5 * c[k + 5])))) * this.invH;
  }

  /** Value at grid node i (exact input value). */
  node(i: number): number {
    return i < this.panels ? this.c[6 * i] : this.last;
  }
}
