#!/usr/bin/python3
"""Reference values of Kendall's tau-b for Demandscape's rank-stability report, computed OUTSIDE
the project with scipy.stats.kendalltau (variant 'b', the default; handles ties).

Run with Debian's interpreter (python3-scipy):
    /usr/bin/python3 tests/reference/kendall_tau.py
Writes tests/reference/expected/kendall-tau.json: every pair of rankings below together with
scipy's tau. The rankings are fixed here (the long ones are written out literally so the file,
not a random generator, is the input). packages/core/src/scoring/kendall-tau.test.ts compares.
"""
import json
import os

import scipy
from scipy import stats

CASES = [
    ("identical", [1, 2, 3, 4, 5], [1, 2, 3, 4, 5]),
    ("reversed", [1, 2, 3, 4, 5, 6], [6, 5, 4, 3, 2, 1]),
    ("one swap", [1, 2, 3, 4], [1, 3, 2, 4]),
    ("ties in the first", [1, 2, 2, 3, 4, 4, 5], [1, 3, 2, 4, 5, 7, 6]),
    ("ties in both", [1, 1, 2, 3, 3, 3, 4, 5], [2, 1, 1, 3, 4, 4, 5, 5]),
    ("scores not ranks", [812.5, 640.0, 640.0, 92.25, 301.0, 455.5], [790.0, 700.5, 512.0, 101.0, 101.0, 460.0]),
    ("twelve candidates, bandwidth halved", [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12], [2, 1, 3, 6, 4, 5, 7, 10, 8, 9, 12, 11]),
    (
        "thirty candidates",
        list(range(1, 31)),
        [3, 1, 2, 7, 5, 4, 6, 12, 9, 8, 10, 11, 15, 14, 13, 20, 16, 18, 17, 19, 24, 22, 21, 23, 30, 25, 27, 26, 29, 28],
    ),
    ("negative association with ties", [1, 2, 3, 4, 5, 6, 7, 8], [8, 8, 6, 5, 5, 3, 2, 1]),
]


def main():
    out = {
        "source": "scipy.stats.kendalltau (variant 'b') " + scipy.__version__,
        "cases": [],
    }
    for name, a, b in CASES:
        res = stats.kendalltau(a, b)
        out["cases"].append({"name": name, "a": a, "b": b, "tau": float(res.statistic)})
    path = os.path.join(os.path.dirname(os.path.abspath(__file__)), "expected", "kendall-tau.json")
    with open(path, "w") as f:
        json.dump(out, f, indent=2)
        f.write("\n")
    print("wrote", path)


if __name__ == "__main__":
    main()
