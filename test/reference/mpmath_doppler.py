"""Outside reference for the test suite: the Doppler conventions at 40 digits with Debian's mpmath.

Reads JSON from stdin: {"z": [z, ...], "v": [v_km_s, ...]} (each double taken exactly) and writes
{"velocity": {"optical": [...], "radio": [...], "relativistic": [...]}, "redshift": {same}}: the
velocity [km/s] of each z, and the redshift of each v, by the definitions
v = cz, v = cz/(1+z), v = c((1+z)^2 - 1)/((1+z)^2 + 1), with c = 299792.458 km/s (SI, exact) as the
nearest double holds it (the value both sides use: near v = c the decimal and the double differ in
c - v by 5e-10 relative, which is not a property of either code).
"""
import json
import sys

import mpmath as mp

mp.mp.dps = 40
C = mp.mpf(299792.458)

VELOCITY = {
    "optical": lambda z: C * z,
    "radio": lambda z: C * z / (1 + z),
    "relativistic": lambda z: C * ((1 + z) ** 2 - 1) / ((1 + z) ** 2 + 1),
}
REDSHIFT = {
    "optical": lambda v: v / C,
    "radio": lambda v: v / (C - v),
    "relativistic": lambda v: mp.sqrt((C + v) / (C - v)) - 1,
}

request = json.load(sys.stdin)
json.dump(
    {
        "velocity": {k: [float(f(mp.mpf(z))) for z in request["z"]] for k, f in VELOCITY.items()},
        "redshift": {k: [float(f(mp.mpf(v))) for v in request["v"]] for k, f in REDSHIFT.items()},
    },
    sys.stdout,
)
