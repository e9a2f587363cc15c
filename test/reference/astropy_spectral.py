"""Outside reference for the test suite: astropy's spectral-density and brightness-temperature
equivalencies (Debian python3-astropy).

Reads JSON from stdin:
  {"f_lambda": [[value, unit, wavelength_angstrom], ...],
   "brightness": [[flux_jy, frequency_ghz, major_arcsec, minor_arcsec], ...]}
and writes {"f_nu_jy": [...], "t_b_kelvin": [...]}: f_lambda in `unit` (an astropy unit string) as
f_nu in Jy at the wavelength (u.spectral_density), and the Rayleigh-Jeans brightness temperature of
a flux density spread over the elliptical Gaussian of those FWHM axes (u.brightness_temperature with
the beam area 2 pi sigma_maj sigma_min, sigma = FWHM / sqrt(8 ln 2)).
"""
import json
import math
import sys

import astropy.units as u


def main():
    request = json.load(sys.stdin)
    f_nu = []
    for value, unit, wavelength in request["f_lambda"]:
        q = (value * u.Unit(unit)).to(u.Jy, equivalencies=u.spectral_density(wavelength * u.AA))
        f_nu.append(q.value)
    t_b = []
    to_sigma = 1 / math.sqrt(8 * math.log(2))
    for flux, frequency, major, minor in request["brightness"]:
        beam = 2 * math.pi * (major * to_sigma * u.arcsec) * (minor * to_sigma * u.arcsec)
        t = (flux * u.Jy / beam).to(u.K, equivalencies=u.brightness_temperature(frequency * u.GHz))
        t_b.append(t.value)
    json.dump({"f_nu_jy": f_nu, "t_b_kelvin": t_b}, sys.stdout)


main()
