"""Outside reference for the test suite: Doppler conventions and rest-frame shifts with Debian's astropy.

Reads JSON from stdin:
  {"to_velocity": [[z, convention], ...], "to_redshift": [[v_km_s, convention], ...],
   "redshift_equivalency": [z, ...],
   "rest": [[value, z, "wavelength" | "frequency"], ...], "observed": [[value, z, ...], ...]}
and writes the same keys: velocities [km/s], redshifts, velocities of astropy's doppler_redshift
equivalency [km/s], rest-frame values (SpectralCoord(value, redshift=z).to_rest()) and observed values
(SpectralCoord(value, redshift=0).with_radial_velocity_shift(z)), in the unit given (Angstrom, GHz).

A redshift z is given to astropy as the wavelength (1 + z) Angstrom observed from a line at rest at
1 Angstrom (the caller sends z with 1 + z exact in binary), with the equivalencies doppler_optical,
doppler_radio and doppler_relativistic.
"""
import json
import sys

import astropy.units as u
from astropy.coordinates import SpectralCoord

REST = 1 * u.AA
EQUIVALENCIES = {
    "optical": u.doppler_optical(REST),
    "radio": u.doppler_radio(REST),
    "relativistic": u.doppler_relativistic(REST),
}
UNITS = {"wavelength": u.AA, "frequency": u.GHz}


def main():
    request = json.load(sys.stdin)
    kms = u.km / u.s
    reply = {
        "to_velocity": [((1 + z) * u.AA).to_value(kms, equivalencies=EQUIVALENCIES[c]) for z, c in request.get("to_velocity", [])],
        "to_redshift": [(v * kms).to_value(u.AA, equivalencies=EQUIVALENCIES[c]) - 1 for v, c in request.get("to_redshift", [])],
        "redshift_equivalency": [(z * u.one).to_value(kms, equivalencies=u.doppler_redshift()) for z in request.get("redshift_equivalency", [])],
        "rest": [SpectralCoord(value * UNITS[kind], redshift=z).to_rest().to_value(UNITS[kind]) for value, z, kind in request.get("rest", [])],
        "observed": [
            SpectralCoord(value * UNITS[kind], redshift=0).with_radial_velocity_shift(z * u.one).to_value(UNITS[kind])
            for value, z, kind in request.get("observed", [])
        ],
    }
    json.dump(reply, sys.stdout)


main()
