"""Outside reference for the test suite: published extinction laws with Debian's python3-extinction.

Reads JSON from stdin: {"cases": [{"law": "ccm89" | "odonnell94" | "fitzpatrick99" | "calzetti00",
"r_v": R_V, "wavelengths": [Angstrom, ...]}, ...]} and writes {"a_per_ebv": [[A/E(B-V), ...], ...]}:
the extinction in magnitudes for E(B-V) = 1 mag (A_V = R_V), one list per case.
"""
import json
import sys

import numpy as np
import extinction


def main():
    request = json.load(sys.stdin)
    out = []
    for case in request["cases"]:
        law = getattr(extinction, case["law"])
        r_v = float(case["r_v"])
        wave = np.array(case["wavelengths"], dtype=float)
        out.append([float(v) for v in law(wave, r_v, r_v)])
    json.dump({"a_per_ebv": out}, sys.stdout)


main()
