#!/usr/bin/python3
"""Peer timings for the density benchmark: sklearn KernelDensity and scipy gaussian_kde.

Usage: /usr/bin/python3 peer-python.py SPEC.json  → prints one JSON object per task, one per line.

SPEC: {"points": path, "n": N, "queries": path, "m": M, "fullCells": C,
       "tasks": [{"lib": "sklearn", "kernel": "epanechnikov", "bandwidth": 2500, "rtol": 0,
                  "queries": 2000}, {"lib": "scipy", "bandwidth": 900, "queries": 100}]}
points: float64 little-endian, x[N] then y[N] then w[N] (metres, weights);
queries: float64 qx[M] then qy[M]. Each task evaluates at the first `queries` query points only
and reports the measured seconds plus an extrapolation to all C cells, labelled as such.
Densities are returned per km^2 of weighted points so the caller can cross-check them.
"""
import json
import sys
import time

import numpy as np


def load(spec):
    raw = np.fromfile(spec["points"], dtype="<f8")
    n = spec["n"]
    x, y, w = raw[:n], raw[n : 2 * n], raw[2 * n :]
    q = np.fromfile(spec["queries"], dtype="<f8")
    m = spec["m"]
    return x, y, w, q[:m], q[m:]


def run_sklearn(task, x, y, w, qx, qy):
    import sklearn
    from sklearn.neighbors import KernelDensity

    c0 = time.process_time()
    t0 = time.perf_counter()
    kde = KernelDensity(kernel=task["kernel"], bandwidth=task["bandwidth"], algorithm="kd_tree", rtol=task.get("rtol", 0))
    kde.fit(np.column_stack([x, y]), sample_weight=w)
    fit = time.perf_counter() - t0
    t1 = time.perf_counter()
    c1 = time.process_time()
    with np.errstate(divide="ignore"):
        f = np.exp(kde.score_samples(np.column_stack([qx, qy])))
    evaluate = time.perf_counter() - t1
    cpu = (c1 - c0, time.process_time() - c1)
    return cpu, f"sklearn {sklearn.__version__} KernelDensity kd_tree {task['kernel']} rtol={task.get('rtol', 0)}", fit, evaluate, f * w.sum() * 1e6


def run_scipy(task, x, y, w, qx, qy):
    import scipy
    from scipy import stats

    c0 = time.process_time()
    t0 = time.perf_counter()
    data = np.vstack([x, y])
    kde = stats.gaussian_kde(data, weights=w)
    # Scalar factor so that the kernel sd along the pooled axis equals the requested bandwidth.
    pooled = np.sqrt((kde.covariance[0, 0] + kde.covariance[1, 1]) / 2) / kde.factor
    kde.set_bandwidth(bw_method=task["bandwidth"] / pooled)
    fit = time.perf_counter() - t0
    t1 = time.perf_counter()
    c1 = time.process_time()
    f = kde.evaluate(np.vstack([qx, qy]))
    evaluate = time.perf_counter() - t1
    cpu = (c1 - c0, time.process_time() - c1)
    return cpu, f"scipy {scipy.__version__} gaussian_kde (kernel covariance = data covariance x factor^2)", fit, evaluate, f * w.sum() * 1e6


def main():
    with open(sys.argv[1]) as fh:
        spec = json.load(fh)
    x, y, w, qx, qy = load(spec)
    for task in spec["tasks"]:
        k = min(task["queries"], qx.size)
        runner = run_sklearn if task["lib"] == "sklearn" else run_scipy
        cpu, label, fit, evaluate, values = runner(task, x, y, w, qx[:k], qy[:k])
        print(
            json.dumps(
                {
                    "id": task["id"],
                    "label": label,
                    "fitSeconds": fit,
                    "evalSeconds": evaluate,
                    "queries": k,
                    "extrapolatedSeconds": fit + evaluate * spec["fullCells"] / k,
                    "extrapolatedCpuSeconds": cpu[0] + cpu[1] * spec["fullCells"] / k,
                    "values": values.tolist(),
                }
            ),
            flush=True,
        )


if __name__ == "__main__":
    main()
