"""Times the benchmark workload through the reference library (astropy), for the speed ratio.

Reads {"models": {name: {...astropy args...}}, "n": {name: count}} on stdin; prints
{name: {quantity: ns_per_value}}. Redshifts are uniform in [0, 10] from a fixed seed.
"""
import json
import sys
import time

import astropy.units as u
import numpy as np
from astropy.cosmology import FlatLambdaCDM


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
        out[name] = timings
    json.dump(out, sys.stdout)


if __name__ == "__main__":
    main()
