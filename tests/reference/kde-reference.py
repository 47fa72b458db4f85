#!/usr/bin/python3
"""Reference values for Demandscape's density engine, computed OUTSIDE the project.

Run with Debian's interpreter (python3-scipy, python3-sklearn):
    /usr/bin/python3 tests/reference/kde-reference.py
or  npm run reference -w @demandscape/core

Writes tests/reference/expected/*.json. The input points live in tests/reference/input/*.csv;
they are generated (seeded, invented) only when missing, and always read back from the CSV so
both sides use the identical decimal input.

Sources of truth:
  * sklearn.neighbors.KernelDensity (gaussian, epanechnikov, tophat, linear), isotropic kernels
    with sample weights, atol = rtol = 0 (exact sums);
  * scipy.stats.multivariate_normal sums (Gaussian with covariance h^2 I), a second route;
  * quartic and triweight have no library counterpart: their normalisation and second moment are
    integrated with scipy.integrate.dblquad, and the surface is the closed-form direct sum;
  * scipy.stats.gaussian_kde(weights=...).factor (Scott: neff^(-1/6) in 2-D) and its weighted
    covariance for the normal-reference bandwidth.
"""
import csv
import json
import math
import os
import sys

import numpy as np
import scipy
import sklearn
from scipy import integrate, stats
from sklearn.neighbors import KernelDensity

HERE = os.path.dirname(os.path.abspath(__file__))
INPUT = os.path.join(HERE, "input")
EXPECTED = os.path.join(HERE, "expected")

# Reference grid: 50 m cells over [0, 20 km] x [0, 15 km]; cell (i, j) centre at
# (ORIGIN + (i + 0.5) * CELL), j = 0 is the southern row.
GRID = {"originX": 0.0, "originY": 0.0, "cellSize": 50.0, "width": 400, "height": 300}
SAMPLE_CELLS = 600
# Bandwidths in metres: radius for compact kernels, standard deviation for the Gaussian.
CASES = [
    ("quartic", 1500.0),
    ("triweight", 1800.0),
    ("epanechnikov", 1200.0),
    ("uniform", 1000.0),
    ("triangular", 1400.0),
    ("gaussian", 500.0),
]
SKLEARN_NAME = {"gaussian": "gaussian", "epanechnikov": "epanechnikov", "uniform": "tophat", "triangular": "linear"}
POLY_POWER = {"quartic": 2, "triweight": 3}


def points_planar_write(path):
    """Invented clustered customers (metres), three districts plus scatter, weights = annual spend."""
    rng = np.random.default_rng(20270101)
    centres = [(6000.0, 5000.0, 900.0, 160), (12500.0, 9000.0, 1400.0, 140), (15000.0, 4500.0, 600.0, 60)]
    xs, ys = [], []
    for cx, cy, sd, n in centres:
        xs.append(rng.normal(cx, sd, n))
        ys.append(rng.normal(cy, sd, n))
    xs.append(rng.uniform(3000, 17000, 40))
    ys.append(rng.uniform(3000, 12000, 40))
    x = np.clip(np.concatenate(xs), 2500, 17500)
    y = np.clip(np.concatenate(ys), 2500, 12500)
    w = np.round(rng.gamma(2.0, 150.0, x.size), 2)
    with open(path, "w", newline="") as f:
        out = csv.writer(f)
        out.writerow(["x", "y", "weight"])
        for row in zip(x, y, w):
            out.writerow([f"{row[0]:.3f}", f"{row[1]:.3f}", f"{row[2]:.2f}"])


def points_bandwidth_write(path):
    """Invented points spread uniformly over a 12 km x 8 km rectangle: the sd is clearly below
    IQR/1.349 (uniform: 0.289 L vs 0.371 L), so robust and plain normal-reference rules agree."""
    rng = np.random.default_rng(20270102)
    n = 500
    x = rng.uniform(0, 12000, n)
    y = rng.uniform(0, 8000, n)
    w = np.round(rng.uniform(1, 5, n), 1)
    with open(path, "w", newline="") as f:
        out = csv.writer(f)
        out.writerow(["x", "y", "weight"])
        for row in zip(x, y, w):
            out.writerow([f"{row[0]:.3f}", f"{row[1]:.3f}", f"{row[2]:.1f}"])


def points_read(path):
    with open(path, newline="") as f:
        rows = list(csv.DictReader(f))
    return (
        np.array([float(r["x"]) for r in rows]),
        np.array([float(r["y"]) for r in rows]),
        np.array([float(r["weight"]) for r in rows]),
    )


def grid_centres():
    cs = GRID["cellSize"]
    gx = GRID["originX"] + (np.arange(GRID["width"]) + 0.5) * cs
    gy = GRID["originY"] + (np.arange(GRID["height"]) + 0.5) * cs
    xx, yy = np.meshgrid(gx, gy)  # row j, column i
    return xx.ravel(), yy.ravel()


def intensity_sklearn(kernel, h, x, y, w, qx, qy):
    kde = KernelDensity(kernel=SKLEARN_NAME[kernel], bandwidth=h, algorithm="kd_tree", atol=0, rtol=0)
    kde.fit(np.column_stack([x, y]), sample_weight=w)
    # score_samples: log of a density per m^2 normalised by sum(w); intensity per km^2 = sum(w) * f * 1e6.
    with np.errstate(divide="ignore"):
        return w.sum() * np.exp(kde.score_samples(np.column_stack([qx, qy]))) * 1e6


def intensity_scipy_gaussian(h, x, y, w, qx, qy):
    q = np.column_stack([qx, qy])
    total = np.zeros(q.shape[0])
    for xi, yi, wi in zip(x, y, w):
        total += wi * stats.multivariate_normal.pdf(q, mean=[xi, yi], cov=h * h * np.eye(2))
    return total * 1e6


def intensity_closed_form(q_power, h, x, y, w, qx, qy):
    c = (q_power + 1) / math.pi
    total = np.zeros(qx.size)
    for xi, yi, wi in zip(x, y, w):
        r2 = ((qx - xi) ** 2 + (qy - yi) ** 2) / (h * h)
        total += wi * np.where(r2 < 1, c * np.clip(1 - r2, 0, None) ** q_power, 0.0) / (h * h)
    return total * 1e6


def uniform_cell_means(h, x, y, w, qx, qy):
    """The disc kernel has a jump, so on a 50 m grid the engine reports cell MEANS of the intensity,
    taken on an s x s sub-lattice (offsets (p + 0.5)/s - 0.5 cells). Reference: the same means of
    sklearn's tophat, for s = 2, the sub-lattice the engine picks for h = 1000 m, 50 m cells."""
    s = 2
    offsets = [((p + 0.5) / s - 0.5) * GRID["cellSize"] for p in range(s)]
    total = np.zeros(qx.size)
    for dy in offsets:
        for dx in offsets:
            total += intensity_sklearn("uniform", h, x, y, w, qx + dx, qy + dy)
    return {"oversample": s, "values": (total / (s * s)).tolist()}


def kernel_integrals(q_power):
    c = (q_power + 1) / math.pi
    k = lambda r: c * (1 - r * r) ** q_power
    # Polar coordinates: integral over the unit disc of K (mass) and of u1^2 K = r^2 cos^2 K (mu2).
    mass, _ = integrate.dblquad(lambda r, t: k(r) * r, 0, 2 * math.pi, 0, 1, epsabs=1e-13, epsrel=1e-13)
    mu2, _ = integrate.dblquad(
        lambda r, t: (r * math.cos(t)) ** 2 * k(r) * r, 0, 2 * math.pi, 0, 1, epsabs=1e-13, epsrel=1e-13
    )
    rough, _ = integrate.dblquad(lambda r, t: k(r) ** 2 * r, 0, 2 * math.pi, 0, 1, epsabs=1e-13, epsrel=1e-13)
    return {"mass": mass, "mu2": mu2, "roughness": rough}


def sklearn_single_point_mass(kernel):
    """Integral over the plane of sklearn's 2-D density of one point with h = 1: checks that sklearn
    normalises its kernels per dimension d = 2 exactly as our K (mass 1)."""
    kde = KernelDensity(kernel=SKLEARN_NAME[kernel], bandwidth=1.0).fit(np.zeros((1, 2)))
    reach = 8.0 if kernel == "gaussian" else 1.0
    f = lambda r, t: math.exp(kde.score_samples([[r * math.cos(t), r * math.sin(t)]])[0]) * r
    mass, _ = integrate.dblquad(f, 0, 2 * math.pi, 0, reach, epsabs=1e-10, epsrel=1e-10)
    k0 = math.exp(kde.score_samples([[0.0, 0.0]])[0])
    return {"mass": mass, "valueAtZero": k0}


def kde_cases(x, y, w):
    qx, qy = grid_centres()
    rng = np.random.default_rng(7)
    n_cells = GRID["width"] * GRID["height"]
    cases = []
    for kernel, h in CASES:
        if kernel in POLY_POWER:
            full = intensity_closed_form(POLY_POWER[kernel], h, x, y, w, qx, qy)
            source = f"closed form (q+1)/pi (1-r^2)^q, q={POLY_POWER[kernel]}, summed with numpy"
        else:
            full = intensity_sklearn(kernel, h, x, y, w, qx, qy)
            source = f"sklearn {sklearn.__version__} KernelDensity(kernel='{SKLEARN_NAME[kernel]}', atol=0, rtol=0)"
        peak = int(np.argmax(full))
        picks = set(rng.choice(n_cells, SAMPLE_CELLS, replace=False).tolist())
        picks.add(peak)
        picks = sorted(picks)
        case = {
            "kernel": kernel,
            "bandwidth": h,
            "source": source,
            "max": float(full[peak]),
            "maxCell": {"i": peak % GRID["width"], "j": peak // GRID["width"]},
            "integral": float(full.sum() * (GRID["cellSize"] / 1000.0) ** 2),
            "samples": [[p % GRID["width"], p // GRID["width"], float(full[p])] for p in picks],
        }
        if kernel == "uniform":
            case["cellMeans"] = uniform_cell_means(h, x, y, w, qx[picks], qy[picks])
        if kernel == "gaussian":
            alt = intensity_scipy_gaussian(h, x, y, w, qx[picks], qy[picks])
            case["scipyMultivariateNormalMaxRelDiff"] = float(np.max(np.abs(alt - full[picks]) / full[peak]))
        cases.append(case)
    return cases


def bandwidth_reference(x, y, w):
    kde = stats.gaussian_kde(np.vstack([x, y]), weights=w)
    cov = kde.covariance / kde.factor**2  # weighted data covariance (np.cov with aweights, ddof=1)
    wn = w / w.sum()
    mx, my = np.sum(wn * x), np.sum(wn * y)
    pop_var_x, pop_var_y = np.sum(wn * (x - mx) ** 2), np.sum(wn * (y - my) ** 2)
    pooled_scipy = math.sqrt((cov[0, 0] + cov[1, 1]) / 2)
    pooled_pop = math.sqrt((pop_var_x + pop_var_y) / 2)
    return {
        "source": f"scipy {scipy.__version__} stats.gaussian_kde(weights=w): factor = neff^(-1/6) (Scott), covariance",
        "n": int(x.size),
        "neff": float(kde.neff),
        "factor": float(kde.factor),
        "weightedCovariance": cov.tolist(),
        "populationVariance": [float(pop_var_x), float(pop_var_y)],
        # One isotropic Gaussian sd: sqrt of the mean of the axis variances, times Scott's factor.
        "gaussianSdFromScipyCovariance": pooled_scipy * kde.factor,
        "gaussianSdFromPopulationVariance": pooled_pop * kde.factor,
        "iqrOver1349": [
            float((np.percentile(x, 75) - np.percentile(x, 25)) / 1.349),
            float((np.percentile(y, 75) - np.percentile(y, 25)) / 1.349),
        ],
    }


def main():
    os.makedirs(INPUT, exist_ok=True)
    os.makedirs(EXPECTED, exist_ok=True)
    planar = os.path.join(INPUT, "points-planar.csv")
    spread = os.path.join(INPUT, "points-bandwidth.csv")
    if not os.path.exists(planar):
        points_planar_write(planar)
    if not os.path.exists(spread):
        points_bandwidth_write(spread)
    x, y, w = points_read(planar)
    versions = {"python": sys.version.split()[0], "numpy": np.__version__, "scipy": scipy.__version__, "sklearn": sklearn.__version__}
    kde = {
        "versions": versions,
        "input": "tests/reference/input/points-planar.csv",
        "units": "intensity in weight per km^2; coordinates and bandwidths in metres",
        "grid": GRID,
        "totalWeight": float(w.sum()),
        "cases": kde_cases(x, y, w),
    }
    kernels = {
        "versions": versions,
        "closedForm": {name: kernel_integrals(q) for name, q in POLY_POWER.items()},
        "sklearnSinglePoint": {name: sklearn_single_point_mass(name) for name in SKLEARN_NAME},
    }
    bx, by, bw = points_read(spread)
    bandwidth = {"versions": versions, "input": "tests/reference/input/points-bandwidth.csv", **bandwidth_reference(bx, by, bw)}
    for name, payload in (("kde-planar", kde), ("kernel-constants", kernels), ("bandwidth-normal-reference", bandwidth)):
        with open(os.path.join(EXPECTED, f"{name}.json"), "w") as f:
            json.dump(payload, f, indent=1)
            f.write("\n")
    print(f"wrote {EXPECTED}/kde-planar.json, kernel-constants.json, bandwidth-normal-reference.json")


if __name__ == "__main__":
    main()
