"""Outside reference for the linear growth: an independent integration, sharing no code with zcell.

The growth equation in cosmic time, d/dt (a² dD/dt) = 4πG ρ_s a² D (Peebles 1980, §10), written for
x = ln a with u = a³ E dD/da (H0 = 1):
    dD/dx = u / (a² E),   du/dx = (3/2) S(a) a² D / E,
where S(a) = ρ_s / ρ_crit,0 is the density that clusters: CDM + baryons ("smooth"), plus the massive
neutrinos' ρ − 3P ("clustering"). No derivative of E enters. Solved by an adaptive Dormand–Prince 5(4)
Runge–Kutta pair (Dormand & Prince 1980, J. Comput. Appl. Math. 6, 19) with a relative tolerance of
1e-12, started at a = 1e-15 with D = 1, dD/dx = 0 (deep in radiation domination, no assumption about
the growing mode: the mode left over grows only as ln a, ~1e-9 here, and decays after equality).

The neutrino integrals (energy density and ρ − 3P, Fermi–Dirac, relative to one massless species)
use Gauss–Legendre panels in plain floats, checked against mpmath.quad (Debian python3-mpmath) at
start-up to 1e-13.

Dark energy: w(a) = w0 + wa (1 − a), ρ_DE ∝ a^(−3(1 + w0 + wa)) exp(−3 wa (1 − a)) (Chevallier & Polarski
2001; Linder 2003, PRL 90, 091301, eq. 3), w0 = −1 and wa = 0 (Λ) unless given.

Reads JSON from stdin: {"models": [{"id", "H0", "Om", "Tcmb", "Neff", "mnu": [eV ...], "w0"?, "wa"?}] (flat),
"z": [...], "conventions": ["smooth", "clustering"]} and writes {id: {convention: {"d": [D(z)/D(0)],
"f": [dlnD/dlna]}}}. Constants: SI 2019 exact values, CODATA 2018 G and k_B, IAU 2012/2015 au and pc.
"""
import json
import math
import sys

import mpmath as mp

C = 299792458.0  # m/s, exact (SI 2019)
AU = 149597870700.0  # m, IAU 2012 B2
MPC = 1e6 * 648000 / math.pi * AU  # m, IAU 2015 B2 parsec
G = 6.67430e-11  # CODATA 2018
SIGMA_SB = 5.670374419e-8  # W m-2 K-4, exact (SI 2019)
KB_EV = 8.617333262e-5  # eV/K, CODATA 2018 (exact in SI 2019)
NORM = 120 / (7 * math.pi**4)  # 1 / ∫x³/(eˣ+1)dx


def legendre_nodes(n):
    """Gauss–Legendre nodes and weights on [-1, 1] by Newton's method on P_n (Abramowitz & Stegun 25.4.29)."""
    nodes, weights = [], []
    for i in range(1, n + 1):
        x = math.cos(math.pi * (i - 0.25) / (n + 0.5))
        for _ in range(100):
            p0, p1 = 1.0, x
            for k in range(2, n + 1):
                p0, p1 = p1, ((2 * k - 1) * x * p1 - (k - 1) * p0) / k
            dp = n * (x * p1 - p0) / (x * x - 1)
            dx = p1 / dp
            x -= dx
            if abs(dx) < 1e-16:
                break
        nodes.append(x)
        weights.append(2 / ((1 - x * x) * dp * dp))
    return nodes, weights


GL_X, GL_W = legendre_nodes(24)


def panel_points(edges):
    """(x, weight / (eˣ + 1)) of Gauss–Legendre panels between the edges."""
    points = []
    for lo, hi in zip(edges, edges[1:]):
        half, mid = (hi - lo) / 2, (hi + lo) / 2
        for t, w in zip(GL_X, GL_W):
            x = mid + half * t
            points.append((x, half * w / (math.exp(x) + 1)))
    return points


POINTS = panel_points([0, 0.5, 2, 5, 10, 20, 35, 60, 100])


def points_for(y):
    """The panels, graded geometrically from y up to 0.5 when y is small (√(x² + y²) bends at x ≈ y)."""
    if y >= 0.1:
        return POINTS
    edges = [0, y]
    while edges[-1] < 0.25:
        edges.append(2 * edges[-1])
    return panel_points(edges + [0.5]) + POINTS[len(GL_X):]


def rho(y):
    """Energy density of one massive species over the same species massless: K ∫ x² √(x² + y²) / (eˣ + 1) dx."""
    return NORM * sum(w * x * x * math.sqrt(x * x + y * y) for x, w in points_for(y))


def rho_minus_3p(y):
    """(ρ − 3P) of one massive species over ρ of the same species massless: K ∫ x² y² / √(x² + y²) / (eˣ + 1) dx."""
    return NORM * sum(w * x * x * y * y / math.sqrt(x * x + y * y) for x, w in points_for(y))


def check_quadrature():
    mp.mp.dps = 25
    for y in [1e-6, 1e-4, 1e-3, 0.01, 0.05, 0.1, 0.3, 1, 3, 10, 40, 200, 1000, 5000]:
        yy = mp.mpf(y)
        occ = lambda x: 1 / (mp.exp(x) + 1)
        edges = [0, yy, 1, 5, 20, 60, mp.inf] if y < 1 else [0, 1, 5, 20, 60, mp.inf]
        f = NORM * mp.quad(lambda x: x**2 * mp.sqrt(x**2 + yy**2) * occ(x), edges)
        g = NORM * mp.quad(lambda x: x**2 * yy**2 / mp.sqrt(x**2 + yy**2) * occ(x), edges)
        assert abs(rho(y) / float(f) - 1) < 1e-13, ("rho", y, rho(y), f)
        assert abs(rho_minus_3p(y) - float(g)) < 1e-13 * float(g) + 1e-22, ("rho - 3P", y, rho_minus_3p(y), g)


def background(m):
    h0 = m["H0"] * 1000 / MPC  # s-1
    rho_crit = 3 * h0 * h0 / (8 * math.pi * G)
    og = 4 * SIGMA_SB * m["Tcmb"] ** 4 / C**3 / rho_crit
    one_species = m["Neff"] / 3 * 7 / 8 * (4 / 11) ** (4 / 3) * og
    t_nu = KB_EV * (4 / 11) ** (1 / 3) * m["Tcmb"]
    y0 = [mass / t_nu for mass in m["mnu"] if mass > 0]
    o_rad = og + (3 - len(y0)) * one_species
    o_nu_today = sum(one_species * rho(y) for y in y0)
    o_cold = m["Om"] - o_nu_today
    o_lambda = 1 - m["Om"] - o_rad
    w0, wa = m.get("w0", -1.0), m.get("wa", 0.0)

    def dark_energy(a):
        return o_lambda * math.exp(-3 * (1 + w0 + wa) * math.log(a) - 3 * wa * (1 - a))

    def e(a):
        nu = sum(rho(y * a) for y in y0) * one_species / a**4
        return math.sqrt(o_cold / a**3 + o_rad / a**4 + nu + dark_energy(a))

    def source(a, clustering):
        s = o_cold / a**3
        if clustering:
            s += sum(rho_minus_3p(y * a) for y in y0) * one_species / a**4
        return s

    return e, source


# Dormand–Prince 5(4) tableau
A = [
    [],
    [1 / 5],
    [3 / 40, 9 / 40],
    [44 / 45, -56 / 15, 32 / 9],
    [19372 / 6561, -25360 / 2187, 64448 / 6561, -212 / 729],
    [9017 / 3168, -355 / 33, 46732 / 5247, 49 / 176, -5103 / 18656],
    [35 / 384, 0, 500 / 1113, 125 / 192, -2187 / 6784, 11 / 84],
]
CS = [0, 1 / 5, 3 / 10, 4 / 5, 8 / 9, 1, 1]
B5 = [35 / 384, 0, 500 / 1113, 125 / 192, -2187 / 6784, 11 / 84, 0]
B4 = [5179 / 57600, 0, 7571 / 16695, 393 / 640, -92097 / 339200, 187 / 2100, 1 / 40]


def integrate(rhs, x0, y0, targets, rtol=1e-12):
    """Values of y at each x in `targets` (increasing), adaptive steps landing on each target."""
    x, y, h = x0, list(y0), 1e-3
    out = []
    for target in targets:
        while x < target:
            h = min(h, target - x)
            k = []
            for i in range(7):
                yi = [y[j] + h * sum(A[i][s] * k[s][j] for s in range(i)) for j in range(len(y))]
                k.append(rhs(x + CS[i] * h, yi))
            y5 = [y[j] + h * sum(B5[s] * k[s][j] for s in range(7)) for j in range(len(y))]
            y4 = [y[j] + h * sum(B4[s] * k[s][j] for s in range(7)) for j in range(len(y))]
            err = max(abs(y5[j] - y4[j]) / (rtol * (abs(y5[j]) + abs(y[j])) + 1e-300) for j in range(len(y)))
            if err <= 1:
                x, y = x + h, y5
            h *= min(5.0, max(0.2, 0.9 * (err + 1e-300) ** -0.2))
        out.append(list(y))
    return out


def growth(m, zs, clustering):
    e, source = background(m)

    def rhs(x, y):
        a = math.exp(x)
        ea = e(a)
        return [y[1] / (a * a * ea), 1.5 * source(a, clustering) * a * a * y[0] / ea]

    order = sorted(range(len(zs)), key=lambda i: -zs[i])  # increasing ln a
    targets = [-math.log1p(zs[i]) for i in order]
    if targets[-1] < 0:
        targets.append(0.0)
    values = integrate(rhs, math.log(1e-15), [1.0, 0.0], targets)
    today = values[-1][0]
    d = [0.0] * len(zs)
    f = [0.0] * len(zs)
    for i, (dd, uu) in zip(order, values):
        a = 1 / (1 + zs[i])
        d[i] = dd / today
        f[i] = uu / (a * a * e(a) * dd)
    return {"d": d, "f": f}


def main():
    request = json.load(sys.stdin)
    check_quadrature()
    out = {}
    for m in request["models"]:
        out[m["id"]] = {c: growth(m, request["z"], c == "clustering") for c in request["conventions"]}
    json.dump(out, sys.stdout)


if __name__ == "__main__":
    main()
