"""The bench computations written plainly in NumPy, timed on this machine for comparison.
Usage: python3 bench/numpy_reference.py INPUT.json OUTPUT.json (both written/read by bench/run.ts)."""
import json, sys, time
import numpy as np

def median_time(fn, repeats):
    times, result = [], None
    for _ in range(repeats):
        t0 = time.perf_counter()
        result = fn()
        times.append((time.perf_counter() - t0) * 1000)
    return float(np.median(times)), result

def weights(case):
    return np.asarray(case["re"]) + 1j * np.asarray(case["im"])

def linear_cut(case):
    x, w, u = np.asarray(case["x"]), weights(case), np.sin(np.radians(np.asarray(case["thetaDeg"])))
    af = np.exp(2j * np.pi * np.outer(u, x)) @ w
    return np.abs(af) ** 2

def uv_grid(case):
    # AF[j, i] = sum_r sum_c W[r, c] exp(j2pi(x_c u_i + y_r v_j)) as two matrix products.
    xs, ys, u, v = (np.asarray(case[k]) for k in ("xGrid", "yGrid", "u", "v"))
    W = weights(case).reshape(len(ys), len(xs))
    ex = np.exp(2j * np.pi * np.outer(u, xs))
    ey = np.exp(2j * np.pi * np.outer(v, ys))
    af = ey @ W @ ex.T
    p = np.abs(af) ** 2
    p[(u[None, :] ** 2 + v[:, None] ** 2) > 1] = 0
    return p.ravel()

def theta_phi_grid(case):
    x, y, z, w = np.asarray(case["x"]), np.asarray(case["y"]), np.asarray(case["z"]), weights(case)
    theta, phi = np.radians(np.asarray(case["thetaDeg"])), np.radians(np.asarray(case["phiDeg"]))
    out = np.empty((len(theta), len(phi)))
    for i, t in enumerate(theta):  # one θ row at a time to bound memory
        u, v = np.sin(t) * np.cos(phi), np.sin(t) * np.sin(phi)
        phase = 2 * np.pi * (np.outer(u, x) + np.outer(v, y) + np.cos(t) * z[None, :])
        out[i] = np.abs(np.exp(1j * phase) @ w) ** 2
    return out.ravel()

def planar_directivity(case):
    x, y, w = np.asarray(case["x"]), np.asarray(case["y"]), weights(case)
    r = np.hypot(x[:, None] - x[None, :], y[:, None] - y[None, :])
    s = np.sinc(2 * r)  # sin(2 pi r)/(2 pi r)
    denom = np.real(np.conj(w) @ s @ w)
    peak = np.abs(np.exp(2j * np.pi * (x * case["u0"] + y * case["v0"])) @ w) ** 2
    return np.array([peak / denom])

def planar_cut(case):
    x, y, w = np.asarray(case["x"]), np.asarray(case["y"]), weights(case)
    t, phi = np.radians(np.asarray(case["thetaDeg"])), np.radians(case["phiDeg"])
    u, v = np.sin(t) * np.cos(phi), np.sin(t) * np.sin(phi)
    af = np.exp(2j * np.pi * (np.outer(u, x) + np.outer(v, y))) @ w
    return np.abs(af) ** 2

FUNCTIONS = {"linearCut": linear_cut, "uvGrid": uv_grid, "thetaPhiGrid": theta_phi_grid,
             "planarDirectivity": planar_directivity, "planarCut": planar_cut}

def main():
    with open(sys.argv[1]) as f:
        cases = json.load(f)
    out = {"numpy": np.__version__}
    for case in cases:
        ms, result = median_time(lambda: FUNCTIONS[case["name"]](case), case["repeats"])
        out[case["name"]] = {"medianMs": ms, "values": [float(v) for v in result]}
    with open(sys.argv[2], "w") as f:
        json.dump(out, f)

if __name__ == "__main__":
    main()
