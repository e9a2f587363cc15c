"""Times the reference library (astropy) as a sheet would call it, for the worksheet-path ratios.

Reads {"model": {...astropy args...}, "n_scalar": int, "n_vector": int} on stdin; prints
{"scalar_ns": ns per scalar call of luminosity_distance, "vector_ns": ns per value of one array call}.
Redshifts are uniform in [0.01, 10] from a fixed seed.
"""
import json
import sys
import time

import astropy.units as u
import numpy as np
from astropy.cosmology import FlatLambdaCDM


def main():
    request = json.load(sys.stdin)
    args = request["model"]
    cosmo = FlatLambdaCDM(H0=args["H0"], Om0=args["Om0"], Tcmb0=args["Tcmb0"], Neff=args["Neff"], m_nu=args["m_nu"] * u.eV)
    rng = np.random.default_rng(1)
    scalars = [float(z) for z in rng.uniform(0.01, 10, request["n_scalar"])]
    cosmo.luminosity_distance(scalars[0])
    t0 = time.perf_counter()
    for z in scalars:
        cosmo.luminosity_distance(z)
    scalar_ns = (time.perf_counter() - t0) / len(scalars) * 1e9
    vector = rng.uniform(0.01, 10, request["n_vector"])
    t0 = time.perf_counter()
    cosmo.luminosity_distance(vector)
    vector_ns = (time.perf_counter() - t0) / len(vector) * 1e9
    json.dump({"scalar_ns": scalar_ns, "vector_ns": vector_ns}, sys.stdout)


if __name__ == "__main__":
    main()
