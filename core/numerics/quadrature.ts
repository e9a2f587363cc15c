/**
 * Adaptive Gauss–Kronrod quadrature (7-point Gauss, 15-point Kronrod), the rule pair of QUADPACK
 * (Piessens et al. 1983, "QUADPACK", Springer, routine QK15). Internal helper of the core.
 */

/** Kronrod abscissae on [−1, 1], non-negative half, descending (QUADPACK qk15 `xgk`). */
const kronrodNodes = [
  0.991455371120812639206854697526329, 0.949107912342758524526189684047851,
  0.864864423359769072789712788640926, 0.741531185599394439863864773280788,
  0.586087235467691130294144845693013, 0.405845151377397166906606412076961,
  0.207784955007898467600689403773245, 0,
];
/** Kronrod weights matching `kronrodNodes` (QUADPACK qk15 `wgk`). */
const kronrodWeights = [
  0.02293532201052922496373200805897, 0.063092092629978553290700663189204,
  0.104790010322250183839876322541518, 0.140653259715525918745189590510238,
  0.16900472663926790282658342659855, 0.190350578064785409913256402421014,
  0.204432940075298892414161999234649, 0.209482141084727828012999174891714,
];
/** Gauss weights for the odd-indexed Kronrod nodes 1, 3, 5, 7 (QUADPACK qk15 `wg`). */
const gaussWeights = [
  0.129484966168869693270611432679082, 0.27970539148927666790146777142378,
  0.381830050505118944950369775488975, 0.417959183673469387755102040816327,
];

/** The 7-point Gauss–Legendre rule on [−1, 1] (the Gauss half of the pair), exact for degree ≤ 13. */
export const gaussRule: { nodes: Float64Array; weights: Float64Array } = (() => {
  const nodes = new Float64Array(7);
  const weights = new Float64Array(7);
  for (let j = 0; j < 3; j++) {
    nodes[j] = -kronrodNodes[2 * j + 1];
    weights[j] = gaussWeights[j];
    nodes[6 - j] = kronrodNodes[2 * j + 1];
    weights[6 - j] = gaussWeights[j];
  }
  nodes[3] = 0;
  weights[3] = gaussWeights[3];
  return { nodes, weights };
})();

/** One 15-point Kronrod estimate of ∫_a^b f, with |K15 − G7| as its error estimate. */
export function kronrod15(f: (x: number) => number, a: number, b: number): { value: number; error: number } {
  const centre = 0.5 * (a + b);
  const half = 0.5 * (b - a);
  const fc = f(centre);
  let kronrod = fc * kronrodWeights[7];
  let gauss = fc * gaussWeights[3];
  for (let j = 0; j < 7; j++) {
    const dx = half * kronrodNodes[j];
    const sum = f(centre - dx) + f(centre + dx);
    kronrod += kronrodWeights[j] * sum;
    if (j % 2 === 1) gauss += gaussWeights[(j - 1) / 2] * sum;
  }
  return { value: kronrod * half, error: Math.abs((kronrod - gauss) * half) };
}

/**
 * ∫_a^b f(x) dx by globally adaptive bisection of G7K15 panels until the summed error estimate is
 * below relTol × |result| (or absTol). Intended for smooth integrands on finite intervals.
 *
 * @param f integrand
 * @param a lower limit (finite)
 * @param b upper limit (finite)
 * @param relTol requested relative accuracy, e.g. 1e-14
 * @param absTol requested absolute accuracy (default 0)
 * @returns the integral estimate
 */
export function integrate(f: (x: number) => number, a: number, b: number, relTol = 1e-14, absTol = 0): number {
  if (a === b) return 0;
  type Panel = { a: number; b: number; value: number; error: number };
  const panels: Panel[] = [];
  const initial = 8;
  const step = (b - a) / initial;
  for (let i = 0; i < initial; i++) {
    const lo = a + i * step;
    const hi = i === initial - 1 ? b : lo + step;
    panels.push({ a: lo, b: hi, ...kronrod15(f, lo, hi) });
  }
  for (let iteration = 0; iteration < 2000; iteration++) {
    let total = 0;
    let totalError = 0;
    let worst = 0;
    for (let i = 0; i < panels.length; i++) {
      total += panels[i].value;
      totalError += panels[i].error;
      if (panels[i].error > panels[worst].error) worst = i;
    }
    if (totalError <= Math.max(absTol, relTol * Math.abs(total)) || !Number.isFinite(total)) return total;
    const p = panels[worst];
    const mid = 0.5 * (p.a + p.b);
    if (mid <= p.a || mid >= p.b) return total;
    panels[worst] = { a: p.a, b: mid, ...kronrod15(f, p.a, mid) };
    panels.push({ a: mid, b: p.b, ...kronrod15(f, mid, p.b) });
  }
  return panels.reduce((s, p) => s + p.value, 0);
}
