"""Times the benchmark workload through the reference library (astropy), for the speed ratio.

Reads {"models": {name: {...astropy args...}}, "n": {name: count}} on stdin; prints
{name: {quantity: ns_per_value}}. Redshifts are uniform in [0, 10] from a fixed seed.
"""
import json
import sys
import time

import astropy.units as u
import numpy as np
from astropy.cosmology import FlatLambdaCDM, z_at_value


def main():
    request = json.load(sys.stdin)
    out = {}
    for name, args in request["models"].items():
        n = request["n"][name]
        z = np.random.default_rng(1).uniform(0, 10, n)
        cosmo = FlatLambdaCDM(H0=args["H0"], Om0=args["Om0"], Tcmb0=args["Tcmb0"], Neff=args["Neff"],
                              m_nu=args["m_nu"] * u.eV)
        timings = {}
        for label, f in [
            ("DL", cosmo.luminosity_distance),
            ("lookback", cosmo.lookback_time),
            ("age", cosmo.age),
            ("volume", cosmo.comoving_volume),
        ]:
            t0 = time.perf_counter()
            f(z)
            timings[label] = (time.perf_counter() - t0) / n * 1e9
        # the inverse: z from D_L, one value at a time (astropy solves each separately)
        targets = cosmo.luminosity_distance(z[:50])
        t0 = time.perf_counter()
        for d in targets:
            z_at_value(cosmo.luminosity_distance, d, zmin=1e-8, zmax=20)
        timings["inverseDL"] = (time.perf_counter() - t0) / len(targets) * 1e9
        out[name] = timings
    json.dump(out, sys.stdout)


if __name__ == "__main__":
    main()
