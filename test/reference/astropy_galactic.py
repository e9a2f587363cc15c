"""Outside reference for the test suite: ICRS <-> galactic with Debian's astropy.

Reads JSON from stdin: {"to_galactic": [[ra_deg, dec_deg], ...], "to_icrs": [[l_deg, b_deg], ...]},
writes {"galactic": [[l, b], ...], "icrs": [[ra, dec], ...]} in degrees.
"""
import json
import sys

import astropy.units as u
from astropy.coordinates import SkyCoord


def main():
    request = json.load(sys.stdin)
    galactic = []
    for ra, dec in request["to_galactic"]:
        g = SkyCoord(ra=ra * u.deg, dec=dec * u.deg, frame="icrs").galactic
        galactic.append([g.l.deg, g.b.deg])
    icrs = []
    for l, b in request["to_icrs"]:
        c = SkyCoord(l=l * u.deg, b=b * u.deg, frame="galactic").icrs
        icrs.append([c.ra.deg, c.dec.deg])
    json.dump({"galactic": galactic, "icrs": icrs}, sys.stdout)


main()
