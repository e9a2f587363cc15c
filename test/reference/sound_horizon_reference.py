"""Outside reference for the sound horizon: the direct integral r_s(z_d) = ∫_{z_d}^∞ c_s(z) / H(z) dz with
c_s = c / √(3 (1 + R)), R = 3ρ_b / (4ρ_γ) (Eisenstein & Hu 1998, ApJ 496, 605, eq. 6), by mpmath.quad
(Debian python3-mpmath) over the neutrino energy density of growth_reference.py (Gauss–Legendre panels,
checked there against mpmath.quad), sharing no code with zcell.

Reads JSON from stdin: {"cases": [{"id", "H0", "Om", "Ob", "Tcmb", "Neff", "mnu": [eV ...], "zd"}]}
(flat, Λ) and writes {id: r_s [Mpc]}. Constants: SI 2019 exact values, CODATA 2018 G and k_B, IAU
2012/2015 au and pc.
"""
import json
import sys

import mpmath as mp

from growth_reference import check_quadrature, rho

C = mp.mpf(299792458)
MPC = 10**6 * 648000 / mp.pi * mp.mpf(149597870700)
G = mp.mpf("6.67430e-11")
SIGMA_SB = mp.mpf("5.670374419e-8")
KB_EV = mp.mpf("8.617333262e-5")


def fermi(y):
    return mp.mpf(rho(float(y)))


def sound_horizon(case):
    h0 = mp.mpf(case["H0"]) * 1000 / MPC
    rho_crit = 3 * h0**2 / (8 * mp.pi * G)
    tcmb = mp.mpf(case["Tcmb"])
    og = 4 * SIGMA_SB * tcmb**4 / C**3 / rho_crit
    one = mp.mpf(case["Neff"]) / 3 * mp.mpf(7) / 8 * (mp.mpf(4) / 11) ** (mp.mpf(4) / 3) * og
    t_nu = KB_EV * (mp.mpf(4) / 11) ** (mp.mpf(1) / 3) * tcmb
    y0 = [mp.mpf(m) / t_nu for m in case["mnu"] if m > 0]
    o_rad = og + (3 - len(y0)) * one
    om = mp.mpf(case["Om"])
    o_cold = om - sum(one * fermi(y) for y in y0)
    o_lambda = 1 - om - o_rad
    r0 = 3 * mp.mpf(case["Ob"]) / (4 * og)

    def integrand(z):
        zp = 1 + z
        e2 = o_cold * zp**3 + o_rad * zp**4 + o_lambda + sum(one * zp**4 * fermi(y / zp) for y in y0)
        return 1 / mp.sqrt(3 * (1 + r0 / zp) * e2)

    zd = mp.mpf(case["zd"])
    return C / 1000 / mp.mpf(case["H0"]) * mp.quad(integrand, [zd, 2 * zd, 10 * zd, 1e5, 1e7, mp.inf])


def main():
    request = json.load(sys.stdin)
    check_quadrature()
    mp.mp.dps = 20
    json.dump({case["id"]: float(sound_horizon(case)) for case in request["cases"]}, sys.stdout)


if __name__ == "__main__":
    main()
