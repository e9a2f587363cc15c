/**
 * Piecewise quintic Hermite interpolant on a uniform grid: on each panel the unique degree-5
 * polynomial matching value, first and second derivative at both ends (C² overall). Its error is
 * h⁶ max|f⁽⁶⁾| / 46080 at worst (the Hermite remainder f⁽⁶⁾(ξ)/6! · (x−x₀)³(x−x₁)³).
 * Internal helper of the core; coefficients are stored in the power basis of t ∈ [0, 1].
 *
 * A table is either complete (`fromNodes`) or growing: its panels are set in order, from the first,
 * by a callback the first time a look-up reaches past the last panel set, so that a model's first
 * value does not wait for tables up to z = 1e8 (see distanceTables.ts).
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
  private last: number;
  /** Panels 0 … ready − 1 hold their coefficients (all of them in a complete table). */
  private ready: number;
  private readonly grow: ((panel: number) => void) | undefined;

  /**
   * A growing table: no panel is set until a look-up needs it.
   * @param x0 first grid point
   * @param h grid spacing (> 0)
   * @param panels number of panels (≥ 1)
   * @param grow called with a panel not yet set; it must set the panels up to and including it, in
   *   order, with `setPanels` (or throw)
   */
  constructor(x0: number, h: number, panels: number, grow?: (panel: number) => void) {
    this.x0 = x0;
    this.h = h;
    this.panels = panels;
    this.xEnd = x0 + panels * h;
    this.invH = 1 / h;
    this.c = new Float64Array(6 * panels);
    this.last = Number.NaN;
    this.ready = 0;
    this.grow = grow;
  }

  /**
   * A complete table from its node values.
   * @param x0 first grid point
   * @param h grid spacing (> 0)
   * @param f values at the n ≥ 2 nodes
   * @param df first derivatives df/dx at the nodes
   * @param d2f second derivatives d²f/dx² at the nodes
   */
  static fromNodes(x0: number, h: number, f: ArrayLike<number>, df: ArrayLike<number>, d2f: ArrayLike<number>): QuinticTable {
    const table = new QuinticTable(x0, h, f.length - 1);
    table.setPanels(0, f.length - 1, f, df, d2f);
    return table;
  }

  /**
   * Sets panels from … to − 1 from the node values f, df, d2f at nodes from … to (arrays indexed by
   * node over the whole grid). Panels are set in order: `from` is the first panel not yet set.
   */
  setPanels(from: number, to: number, f: ArrayLike<number>, df: ArrayLike<number>, d2f: ArrayLike<number>): void {
    if (from !== this.ready || !(to > from && to <= this.panels)) throw new RangeError(`panels ${from} … ${to} out of order`);
    const h = this.h;
    const c = this.c;
    for (let i = from; i < to; i++) {
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
    if (to === this.panels) this.last = f[to];
    this.ready = to;
  }

  /** The panel for a look-up at or past the last panel set: clamped to the grid, grown if need be. */
  private reach(i: number): number {
    const panel = i < this.panels ? i : this.panels - 1;
    if (panel >= this.ready) {
      if (!this.grow) throw new RangeError("table panel not set");
      this.grow(panel);
    }
    return panel;
  }

  /** Interpolated value at x ∈ [x0, xEnd] (the caller keeps x in range). */
  value(x: number): number {
    const s = (x - this.x0) * this.invH;
    let i = s | 0; // s ≥ 0 in range, so truncation is floor
    if (i >= this.ready) i = this.reach(i);
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
    if (i >= this.ready) i = this.reach(i);
    else if (i < 0) i = 0;
    const t = s - i;
    const c = this.c;
    const k = 6 * i;
    return (c[k + 1] + t * (2 * c[k + 2] + t * (3 * c[k + 3] + t * (4 * c[k + 4] + t * 5 * c[k + 5])))) * this.invH;
  }

  /** Value at grid node i, 0 ≤ i ≤ panels (exact input value). */
  node(i: number): number {
    if (i >= this.ready) this.reach(i);
    return i < this.panels ? this.c[6 * i] : this.last;
  }
}
