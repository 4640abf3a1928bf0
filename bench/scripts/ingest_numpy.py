#!/usr/bin/python3
"""Side-by-side NumPy/SciPy reference for the Java ingest benchmark (org.gyreplan.bench.ingest.IngestBenchmark).

Reads the same gridded wind file with scipy.io.netcdf_file (memory-mapped), one time step at a time, decodes
packing and fill values, flips latitude to ascending, and computes per step:
  wind stress   tau = rho_a * C_D(|U|) * |U| * U          (Large & Pond 1981: C_D = 1.2e-3 for |U| < 11 m/s,
                                                          (0.49 + 0.065 |U|) 1e-3 above)
  Ekman transport  U_e = tau_y / (rho0 f),  V_e = -tau_x / (rho0 f)       (NaN for |lat| < 5 deg)
  Ekman pumping    w_e = curl(tau) / (rho0 f) + beta tau_x / (rho0 f^2)  (NaN for |lat| < 5 deg)
with curl on the sphere: d(tau_y)/di / dx_j - d(tau_x dx)/dj / (dx_j dy), centred differences, periodic in
longitude for a global grid, second-order one-sided differences at the southern/northern rows -- the same
discretisation as the Java solver's SphericalOperators for an all-ocean grid. Prints cell-steps/s and the same
checksums as the Java benchmark. Uses only Debian's python3-numpy and python3-scipy.

usage: /usr/bin/python3 ingest_numpy.py file.nc [repeats]
"""
import sys
import time

import numpy as np
from scipy.io import netcdf_file

OMEGA = 7.292115e-5     # s-1, sidereal
R = 6.371e6             # m
RHO0 = 1025.0           # kg m-3
RHO_AIR = 1.22          # kg m-3
CUTOFF = 5.0            # degrees


def run(path):
    t0 = time.perf_counter()
    c0 = time.process_time()
    f = netcdf_file(path, 'r', mmap=True, maskandscale=False)
    lat = f.variables['latitude'][:].astype(np.float64)
    lon = f.variables['longitude'][:].astype(np.float64)
    uvar, vvar = f.variables['u10'], f.variables['v10']
    scale = float(uvar.scale_factor)
    offset = float(uvar.add_offset)
    fill = uvar._FillValue
    flip = lat[0] > lat[-1]
    if flip:
        lat = lat[::-1]
    ny, nx = lat.size, lon.size
    nt = uvar.shape[0]
    dlon = np.deg2rad(abs(lon[1] - lon[0]))
    dlat = np.deg2rad(abs(lat[1] - lat[0]))
    phi = np.deg2rad(lat)
    cosphi = np.cos(phi)[:, None]
    dx = R * cosphi * dlon                      # (ny, 1)
    dy = R * dlat
    fcor = (2 * OMEGA * np.sin(phi))[:, None]
    beta = (2 * OMEGA * np.cos(phi) / R)[:, None]
    cut = (np.abs(lat) < CUTOFF)[:, None]
    with np.errstate(divide='ignore', invalid='ignore'):
        inv = np.where(cut, np.nan, 1.0 / (RHO0 * fcor))
        bterm = np.where(cut, np.nan, beta / (RHO0 * fcor * fcor))
    sum_w = np.zeros((ny, nx))
    sum_tx = np.zeros((ny, nx))
    sum_ve = np.zeros((ny, nx))
    read_s = 0.0
    for k in range(nt):
        r0 = time.perf_counter()
        ur = uvar[k]
        vr = vvar[k]
        if flip:
            ur = ur[::-1]
            vr = vr[::-1]
        u = np.where(ur == fill, np.nan, ur * scale + offset)
        v = np.where(vr == fill, np.nan, vr * scale + offset)
        read_s += time.perf_counter() - r0
        speed = np.sqrt(u * u + v * v)
        cd = np.where(speed < 11.0, 1.2e-3, (0.49 + 0.065 * speed) * 1e-3)
        fac = RHO_AIR * cd * speed
        tx = fac * u
        ty = fac * v
        ve = -tx * inv
        # curl: along i (periodic), along j with the dx weight
        dv = 0.5 * (np.roll(ty, -1, axis=1) - np.roll(ty, 1, axis=1))
        a = tx * dx
        du = np.empty_like(a)
        du[1:-1] = 0.5 * (a[2:] - a[:-2])
        du[0] = 0.5 * (-3 * a[0] + 4 * a[1] - a[2])
        du[-1] = 0.5 * (3 * a[-1] - 4 * a[-2] + a[-3])
        curl = dv / dx - du / (dx * dy)
        w = curl * inv + tx * bterm
        sum_w += w
        sum_tx += tx
        sum_ve += ve
    secs = time.perf_counter() - t0
    cpu = time.process_time() - c0
    cells = nx * ny * nt

    def mean(s):
        m = s / nt
        return np.nanmean(m)

    def mean_abs(s):
        return np.nanmean(np.abs(s / nt))

    print("numpy: %d x %d cells x %d steps = %.3g cell-steps in %.2f s wall, %.2f s CPU (read+decode %.2f s): "
          "%.3g cell-steps/s wall, %.3g per CPU-s" % (nx, ny, nt, cells, secs, cpu, read_s, cells / secs, cells / cpu))
    print("numpy checksums: mean tau_x %.9e Pa, mean |V_e| %.9e m2/s, mean w_e %.9e m/s"
          % (mean(sum_tx), mean_abs(sum_ve), mean(sum_w)))
    f.close()


if __name__ == '__main__':
    reps = int(sys.argv[2]) if len(sys.argv) > 2 else 1
    for _ in range(reps):
        run(sys.argv[1])
