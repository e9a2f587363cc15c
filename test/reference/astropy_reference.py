"""Outside reference for the test suite: evaluates cosmological quantities with Debian's astropy.

Reads JSON from stdin: {"cases": [{"id", "H0", "Om0", "Ode0" | null (flat), "w0", "wa", "Tcmb0",
"Neff", "m_nu": [3 masses in eV], "z": [...]}]}, writes {"results": {id: {quantity: [...]}}}.
A case {"id", "realization": name, "z"} uses astropy's own parameter set of that name (e.g. "Planck18").
Om0 is astropy's convention (cold matter + baryons, massive neutrinos excluded); the caller converts.
"""
import json
import sys

import astropy.cosmology
import astropy.units as u
from astropy.cosmology import Flatw0waCDM, w0waCDM


def build(case):
    if "realization" in case:
        return getattr(astropy.cosmology, case["realization"])
    common = dict(
        H0=case["H0"], Om0=case["Om0"], w0=case["w0"], wa=case["wa"],
        Tcmb0=case["Tcmb0"], Neff=case["Neff"], m_nu=case["m_nu"] * u.eV,
    )
    if case["Ode0"] is None:
        return Flatw0waCDM(**common)
    return w0waCDM(Ode0=case["Ode0"], **common)


def main():
    request = json.load(sys.stdin)
    results = {}
    for case in request["cases"]:
        cosmo = build(case)
        z = case["z"]
        results[case["id"]] = {
            "comovingDistanceMpc": cosmo.comoving_distance(z).to_value(u.Mpc).tolist(),
            "transverseComovingDistanceMpc": cosmo.comoving_transverse_distance(z).to_value(u.Mpc).tolist(),
            "angularDiameterDistanceMpc": cosmo.angular_diameter_distance(z).to_value(u.Mpc).tolist(),
            "luminosityDistanceMpc": cosmo.luminosity_distance(z).to_value(u.Mpc).tolist(),
            "lookbackTimeGyr": cosmo.lookback_time(z).to_value(u.Gyr).tolist(),
            "ageGyr": cosmo.age(z).to_value(u.Gyr).tolist(),
            "comovingVolumeMpc3": cosmo.comoving_volume(z).to_value(u.Mpc**3).tolist(),
            "comovingVolumeElementMpc3Sr": cosmo.differential_comoving_volume(z).to_value(u.Mpc**3 / u.sr).tolist(),
            "expansionRate": cosmo.efunc(z).tolist(),
        }
    json.dump({"results": results}, sys.stdout)


if __name__ == "__main__":
    main()
