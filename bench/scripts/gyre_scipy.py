#!/usr/bin/python3
"""Side-by-side reference for the gyre benchmark: the SAME finite-difference discretisation as
org.gyreplan.solver.gyre.GyreOperator on the square beta-plane basin of GyreBench, assembled with scipy.sparse and
solved with scipy.sparse.linalg.spsolve (SuperLU, COLAMD ordering).

    gyre_scipy.py stommel|munk|both N [psi-output.f64] [--compare java-psi.f64]

Rows are the area-scaled, negated operator
    -A [ r Lap(psi) + beta d(psi)/dx - A_H Lap(zeta) ] = -A curl(tau)/rho0,   A = h*h,
with psi = 0 on the coast (land cell centres); zeta = Lap(psi) on ocean cells and, for no-slip walls, the Thom wall
vorticity 2 psi_1 / h^2 on coast cells next to the ocean (corner land cells touch no ocean through an edge: 0).
Prints the solve time, and with --compare the max |difference| relative to max |psi|.
"""
import sys
import time
import resource
import numpy as np
import scipy.sparse as sp
import scipy.sparse.linalg as spla

L, BETA, DELTA, RHO0 = 4e6, 2e-11, 40e3, 1025.0


def lap1d(m, h):
    e = np.ones(m)
    return sp.diags([e[:-1], -2 * e, e[:-1]], [-1, 0, 1]) / h**2


def build(kind, n):
    h = L / (n + 1)
    r = BETA * DELTA if kind in ("stommel", "both") else 0.0
    ah = BETA * DELTA**3 if kind in ("munk", "both") else 0.0
    I = sp.identity(n, format="csr")
    # Laplacian of interior nodes with psi = 0 on the ring (Kronecker form, x fastest)
    lap = (sp.kron(I, lap1d(n, h)) + sp.kron(lap1d(n, h), I)).tocsr()
    e = np.ones(n)
    dx1 = sp.diags([-e[:-1], e[:-1]], [-1, 1]) / (2 * h)
    ddx = sp.kron(I, dx1).tocsr()
    M = r * lap + BETA * ddx
    if ah > 0:
        # extended grid (n+2)^2 with the coast ring; zeta_ext = Z psi
        m = n + 2
        rows, cols, vals = [], [], []
        idx = lambda i, j: j * m + i          # extended index
        oid = lambda i, j: (j - 1) * n + (i - 1)  # ocean index for 1 <= i, j <= n
        lapc = lap.tocoo()
        # ocean rows of Z: the Laplacian
        oi = lapc.row % n + 1
        oj = lapc.row // n + 1
        rows.append(oj * m + oi); cols.append(lapc.col); vals.append(lapc.data)
        # wall rows (no-slip): west/east/south/north rings, excluding corners
        k = np.arange(1, n + 1)
        c2 = 2.0 / h**2
        for (wi, wj, ii, jj) in ((np.zeros(n, int), k, np.ones(n, int), k),            # west wall, ocean at i=1
                                 (np.full(n, m - 1), k, np.full(n, n), k),            # east wall
                                 (k, np.zeros(n, int), k, np.ones(n, int)),            # south wall
                                 (k, np.full(n, m - 1), k, np.full(n, n))):            # north wall
            rows.append(wj * m + wi); cols.append((jj - 1) * n + (ii - 1)); vals.append(np.full(n, c2))
        Z = sp.csr_matrix((np.concatenate(vals), (np.concatenate(rows), np.concatenate(cols))), shape=(m * m, n * n))
        # Laplacian from the extended grid to the ocean nodes
        rr, cc, vv = [], [], []
        jj, ii = np.meshgrid(np.arange(1, n + 1), np.arange(1, n + 1), indexing="ij")
        orow = ((jj - 1) * n + (ii - 1)).ravel()
        for (di, dj, w) in ((0, 0, -4.0), (1, 0, 1.0), (-1, 0, 1.0), (0, 1, 1.0), (0, -1, 1.0)):
            rr.append(orow); cc.append(((jj + dj) * m + (ii + di)).ravel()); vv.append(np.full(n * n, w / h**2))
        Lext = sp.csr_matrix((np.concatenate(vv), (np.concatenate(rr), np.concatenate(cc))), shape=(n * n, m * m))
        M = M - ah * (Lext @ Z)
    A = -(h * h) * M.tocsc()
    y = (np.arange(1, n + 1) * h)
    curl = np.repeat(-1e-7 * np.sin(np.pi * y / L), n)
    b = -(h * h) * curl / RHO0
    return A.tocsc(), b


def main():
    args = [a for a in sys.argv[1:]]
    compare = None
    if "--compare" in args:
        k = args.index("--compare"); compare = args[k + 1]; del args[k:k + 2]
    kind, n = args[0], int(args[1])
    out = args[2] if len(args) > 2 else None
    t0 = time.perf_counter()
    A, b = build(kind, n)
    t1 = time.perf_counter()
    psi = spla.spsolve(A, b)
    t2 = time.perf_counter()
    res = np.linalg.norm(b - A @ psi) / np.linalg.norm(b)
    print(f"scipy {kind} n={n}: assemble {t1 - t0:.3f} s, spsolve {t2 - t1:.3f} s, total {t2 - t0:.3f} s, residual {res:.2e}")
    print(f"scipy_seconds={t2 - t0:.4f}")
    print(f"scipy_peak_rss_MB={resource.getrusage(resource.RUSAGE_SELF).ru_maxrss / 1024:.1f}")
    if out:
        psi.astype("<f8").tofile(out)
    if compare:
        other = np.fromfile(compare, dtype="<f8")
        d = np.max(np.abs(other - psi)) / np.max(np.abs(psi))
        print(f"max_rel_difference_java_vs_scipy={d:.3e}")


if __name__ == "__main__":
    main()
