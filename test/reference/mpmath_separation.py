"""Outside reference for the test suite: great-circle separations at 40 digits with Debian's mpmath.

Reads JSON from stdin: {"pairs": [[ra1, dec1, ra2, dec2], ...]} in degrees (each double taken exactly)
and writes [separation_deg, ...]: atan2(|v1 x v2|, v1 . v2) of the two unit vectors, which at 40
digits keeps ample precision from micro-arcseconds to 180 degrees.
"""
import json
import sys

import mpmath as mp

mp.mp.dps = 40


def vector(ra, dec):
    a = mp.radians(mp.mpf(ra))
    d = mp.radians(mp.mpf(dec))
    return [mp.cos(d) * mp.cos(a), mp.cos(d) * mp.sin(a), mp.sin(d)]


def separation(ra1, dec1, ra2, dec2):
    u = vector(ra1, dec1)
    v = vector(ra2, dec2)
    cross = [u[1] * v[2] - u[2] * v[1], u[2] * v[0] - u[0] * v[2], u[0] * v[1] - u[1] * v[0]]
    dot = u[0] * v[0] + u[1] * v[1] + u[2] * v[2]
    return mp.degrees(mp.atan2(mp.sqrt(sum(c * c for c in cross)), dot))


request = json.load(sys.stdin)
json.dump([float(separation(*pair)) for pair in request["pairs"]], sys.stdout)
