#!/usr/bin/env python3
"""Generate the invented input data of the Gyreplan demo and example scenarios.

Everything here is synthetic: the basins, coasts, ports and winds are invented for demonstration and testing.
Needs only python3 with numpy and scipy (Debian: python3-numpy, python3-scipy).

    python3 scenarios/make_scenario_data.py            # writes all three scenarios' data
    python3 scenarios/make_scenario_data.py demo       # only the demo

The output is deterministic (fixed random seeds), so the committed files can be regenerated bit for bit
with the same numpy/scipy versions.

Data written per scenario folder:
  demo/            Merrow Basin, Tessel Coast, Port Anselm (northern hemisphere, eastern-boundary upwelling)
    basin.geojson          basin polygon (water area), RFC 7946
    exclusion.geojson      Skerrow Bank reserve (no moorings or stations)
    winds.nc               daily 10 m winds u10/v10, 2021-2022, 0.75 deg, CF-1.8, netCDF-3, int16 packed
    bathymetry.nc          sea-floor elevation, 0.1 deg, int16
  southern-coast/  Caradoc Sea and the Wynmere Coast (southern hemisphere), sea-level pressure input
    winds-slp.nc           daily sea-level pressure, 2021, 1 deg
    bathymetry.nc
  island-bay/      Orlen Basin with Hask Island and Brannoch Bay
    winds.nc               daily 10 m winds, 2021, 1 deg
    bathymetry.nc

Wind model (demo): a zonal band of trade winds (easterly) in the south and westerlies in the north,
u = -U0 cos(pi (lat - south)/(north - south)), whose belt shifts 2 deg poleward in summer and whose westerlies
strengthen in winter; plus an equatorward coastal jet along the eastern coast whose speed peaks in July and
which reverses (poleward, downwelling-favourable) in the northern part in winter; the jet's speed peaks about
200 km offshore and weakens toward the coast (cyclonic curl next to the coast, as described by Bakun & Nelson
1991); plus weather noise: an AR(1) process in time (3-day memory) smoothed in space, amplitude ~2.5 m/s.

The script also prints reference numbers computed here with numpy, independently of Gyreplan, which the
scenarios' `expected` blocks use: the time-mean basin-mean stress with a constant drag coefficient range,
and the Sverdrup streamfunction maximum from the eastern-boundary integral of the mean curl.
"""
import json
import sys
from pathlib import Path

import numpy as np
from scipy.io import netcdf_file
from scipy.ndimage import gaussian_filter

HERE = Path(__file__).resolve().parent
OMEGA, R_EARTH, RHO0, RHO_AIR = 7.292115e-5, 6.371e6, 1025.0, 1.22


# ---------------------------------------------------------------- geometry helpers

def inside(lon, lat, ring):
    """Even-odd point-in-polygon for arrays of points (ring: list of (lon, lat), not closed)."""
    x, y = np.asarray(lon, float), np.asarray(lat, float)
    res = np.zeros(np.broadcast(x, y).shape, bool)
    n = len(ring)
    for k in range(n):
        x1, y1 = ring[k]
        x2, y2 = ring[(k + 1) % n]
        cond = ((y1 > y) != (y2 > y))
        with np.errstate(divide="ignore", invalid="ignore"):
            xc = x1 + (y - y1) * (x2 - x1) / (y2 - y1)
        res ^= cond & (x < xc)
    return res


def distance_km(lon, lat, ring):
    """Distance (km, local flat approximation) from points to the nearest edge of a ring."""
    lon, lat = np.asarray(lon, float), np.asarray(lat, float)
    best = np.full(np.broadcast(lon, lat).shape, np.inf)
    kx = 111.32 * np.cos(np.radians(lat))
    ky = 110.57
    n = len(ring)
    for k in range(n):
        x1, y1 = ring[k]
        x2, y2 = ring[(k + 1) % n]
        px, py = (lon - x1) * kx, (lat - y1) * ky
        dx, dy = (x2 - x1) * kx, (y2 - y1) * ky
        t = np.clip((px * dx + py * dy) / np.maximum(dx * dx + dy * dy, 1e-12), 0, 1)
        best = np.minimum(best, np.hypot(px - t * dx, py - t * dy))
    return best


def geojson_polygon(path, name, rings, props=None):
    feats = []
    for nm, rr in rings:
        coords = [[[round(a, 4), round(b, 4)] for a, b in r + [r[0]]] for r in rr]
        p = {"name": nm}
        p.update(props or {})
        feats.append({"type": "Feature", "properties": p, "geometry": {"type": "Polygon", "coordinates": coords}})
    doc = {"type": "FeatureCollection", "name": name, "features": feats}
    path.write_text(json.dumps(doc, indent=1) + "\n")


# ---------------------------------------------------------------- netCDF helpers

def packed(nc, name, dims, data, units, long_name, standard_name=None, scale=0.01, offset=0.0, extra=None):
    v = nc.createVariable(name, "h", dims)
    fill = np.int16(-32767)
    q = np.round((np.asarray(data) - offset) / scale)
    q = np.where(np.isfinite(data), q, fill)
    if np.nanmax(np.abs(q[q != fill])) > 32000:
        raise SystemExit(f"{name}: values do not fit int16 with scale {scale}")
    v[:] = q.astype(np.int16)
    v.scale_factor = np.float32(scale)
    v.add_offset = np.float32(offset)
    v._FillValue = fill
    v.units = units
    v.long_name = long_name
    if standard_name:
        v.standard_name = standard_name
    for k, val in (extra or {}).items():
        setattr(v, k, val)


def coords(nc, lon, lat, ntime=None, time_units=None):
    if ntime is not None:
        nc.createDimension("time", ntime)
    nc.createDimension("lat", len(lat))
    nc.createDimension("lon", len(lon))
    if ntime is not None:
        t = nc.createVariable("time", "d", ("time",))
        t[:] = np.arange(ntime, dtype=float)
        t.units = time_units
        t.calendar = "standard"
        t.standard_name = "time"
        t.axis = "T"
    y = nc.createVariable("lat", "f", ("lat",))
    y[:] = lat
    y.units = "degrees_north"
    y.standard_name = "latitude"
    y.axis = "Y"
    x = nc.createVariable("lon", "f", ("lon",))
    x[:] = lon
    x.units = "degrees_east"
    x.standard_name = "longitude"
    x.axis = "X"


def global_attrs(nc, title):
    nc.Conventions = "CF-1.8"
    nc.title = title
    nc.institution = "Gyreplan project (invented demonstration data)"
    nc.source = "synthetic: scenarios/make_scenario_data.py"
    nc.comment = "Invented data for a fictional basin; not observations. Do not use for navigation or science."


def weather_noise(rng, nt, ny, nx, amp, memory_days=3.0, sigma_cells=2.5):
    """AR(1) in time, Gaussian-smoothed in space; returns (u, v) noise of shape (nt, ny, nx)."""
    a = np.exp(-1.0 / memory_days)
    out_u = np.empty((nt, ny, nx), np.float32)
    out_v = np.empty((nt, ny, nx), np.float32)
    su = np.zeros((ny, nx))
    sv = np.zeros((ny, nx))
    b = np.sqrt(1 - a * a)
    for t in range(nt):
        eu = gaussian_filter(rng.standard_normal((ny, nx)), sigma_cells, mode="nearest")
        ev = gaussian_filter(rng.standard_normal((ny, nx)), sigma_cells, mode="nearest")
        eu /= eu.std() + 1e-12
        ev /= ev.std() + 1e-12
        su = a * su + b * eu
        sv = a * sv + b * ev
        out_u[t] = amp * su
        out_v[t] = amp * sv
    return out_u, out_v


def bathymetry(path, ring, islands, lon, lat, shelf_km=40.0, title="bathymetry"):
    LON, LAT = np.meshgrid(lon, lat)
    wet = inside(LON, LAT, ring)
    for isl in islands:
        wet &= ~inside(LON, LAT, isl)
    d = distance_km(LON, LAT, ring)
    for isl in islands:
        d = np.minimum(d, distance_km(LON, LAT, isl))
    # shelf: 10 m at the coast to 150 m at the shelf break; slope to 3000 m within ~60 km; abyss 4500 m.
    depth = np.where(d < shelf_km, 10 + 140 * d / shelf_km,
                     150 + 2850 * np.tanh((d - shelf_km) / 60.0) + 1500 * np.clip((d - shelf_km - 150) / 400, 0, 1))
    elev = np.where(wet, -depth, 50 + 2 * d)  # gentle land rising inland
    with netcdf_file(path, "w", version=1) as nc:
        global_attrs(nc, title)
        coords(nc, lon, lat)
        packed(nc, "elevation", ("lat", "lon"), elev.astype(float), "m",
               "height of the sea floor (negative) or land surface above mean sea level",
               standard_name="height_above_mean_sea_level", scale=1.0, extra={"positive": "up"})
    return elev


def sverdrup_max_sv(lon, lat, taux, tauy, wet):
    """Max of psi = -(1/(rho0 beta)) * integral from x to the eastern coast of curl(tau) dx, in Sv (numpy reference)."""
    dlon = np.radians(lon[1] - lon[0])
    dlat = np.radians(lat[1] - lat[0])
    coslat = np.cos(np.radians(lat))[:, None]
    dx = R_EARTH * coslat * dlon
    dy = R_EARTH * dlat
    # curl = (1/(R cos)) d(tauy)/dlon - (1/(R cos)) d(taux cos)/dlat
    dty = np.gradient(tauy, axis=1) / dx
    dtx = np.gradient(taux * coslat, axis=0) / (dy * coslat)
    curl = dty - dtx
    beta = 2 * OMEGA * np.cos(np.radians(lat))[:, None] / R_EARTH
    psi = np.zeros_like(curl)
    for j in range(len(lat)):
        acc = 0.0
        for i in range(len(lon) - 1, -1, -1):
            if not wet[j, i]:
                acc = 0.0
                continue
            acc += curl[j, i] * dx[j, 0]
            psi[j, i] = -acc / (RHO0 * beta[j, 0])
    return np.nanmax(psi[wet]) / 1e6


# ---------------------------------------------------------------- demo: Merrow Basin

DEMO_RING = [(-150.0, 24.0), (-131.5, 24.0), (-130.6, 28.0), (-129.8, 32.0), (-129.3, 35.2),
             (-130.4, 36.2), (-129.6, 37.3), (-129.0, 40.0), (-128.6, 43.0), (-128.3, 46.0),
             (-150.0, 46.0), (-150.6, 40.0), (-150.3, 32.0)]
DEMO_RESERVE = [(-129.55, 38.1), (-129.05, 38.1), (-129.05, 38.7), (-129.55, 38.7)]


def east_coast_lon(lat):
    east = [(p[1], p[0]) for p in DEMO_RING[1:10]]
    ys = np.array([e[0] for e in east])
    xs = np.array([e[1] for e in east])
    return np.interp(lat, ys, xs)


def make_demo():
    out = HERE / "demo"
    out.mkdir(exist_ok=True)
    geojson_polygon(out / "basin.geojson", "Merrow Basin", [("Merrow Basin", [DEMO_RING])],
                    {"note": "invented basin for the Gyreplan demo"})
    geojson_polygon(out / "exclusion.geojson", "exclusion zones",
                    [("Skerrow Bank reserve", [DEMO_RESERVE])], {"rule": "no moorings, no stations"})

    lon = np.arange(-151.5, -126.0 + 1e-9, 0.75)
    lat = np.arange(22.5, 47.25 + 1e-9, 0.75)
    days = 730
    LON, LAT = np.meshgrid(lon, lat)
    doy = (np.arange(days) % 365) + 1.0
    rng = np.random.default_rng(20210101)

    south, north = 24.0, 46.0
    d_coast = np.clip(east_coast_lon(LAT) - LON, 0, None) * 111.32 * np.cos(np.radians(LAT))  # km west of coast
    jet_profile = np.where(LON <= east_coast_lon(LAT),
                           0.45 + 0.55 * (d_coast / 200.0) * np.exp(1 - d_coast / 200.0), 0.45)
    jet_profile *= np.exp(-np.clip(d_coast - 200, 0, None) / 500.0)
    north_share = np.clip((LAT - south) / (north - south), 0, 1)

    nu, nv = weather_noise(rng, days, len(lat), len(lon), amp=2.5)
    u = np.empty((days, len(lat), len(lon)), np.float32)
    v = np.empty_like(u)
    for t in range(days):
        season = np.cos(2 * np.pi * (doy[t] - 15) / 365.0)          # +1 mid-January, -1 mid-July
        shift = -2.0 * season                                         # belt 2 deg poleward in summer
        phase = np.pi * (LAT - (south + shift)) / (north - south)
        west_strength = 7.0 + 2.0 * season                            # westerlies stronger in winter
        ub = np.where(np.cos(phase) > 0, 6.0, west_strength) * (-np.cos(phase))
        jet = 5.0 - 4.0 * np.cos(2 * np.pi * (doy[t] - 15) / 365.0)    # 1 m/s in January, 9 m/s in July
        jet_t = jet - 3.5 * north_share * max(season, 0.0)            # northern part turns poleward in winter
        vb = -jet_t * jet_profile                                     # equatorward = southward
        u[t] = ub + nu[t]
        v[t] = vb + nv[t]

    with netcdf_file(out / "winds.nc", "w", version=1) as nc:
        global_attrs(nc, "Merrow Basin synthetic daily 10 m winds")
        coords(nc, lon, lat, days, "days since 2021-01-01 00:00:00")
        packed(nc, "u10", ("time", "lat", "lon"), u, "m s-1", "eastward wind at 10 m", "eastward_wind")
        packed(nc, "v10", ("time", "lat", "lon"), v, "m s-1", "northward wind at 10 m", "northward_wind")

    blon = np.arange(-151.0, -127.0 + 1e-9, 0.1)
    blat = np.arange(23.0, 47.0 + 1e-9, 0.1)
    bathymetry(out / "bathymetry.nc", DEMO_RING, [], blon, blat, title="Merrow Basin synthetic bathymetry")

    # reference numbers (numpy, independent of Gyreplan), drag law of Large & Yeager (2004) as quoted in CHECKS.md
    # (10^3 C_D = 2.7/U + 0.142 + U/13.09, the 1/U term floored at U = 0.5 m/s)
    # cell centres inside the polygon or on its edge, as Gyreplan's basin mask
    wet = inside(LON, LAT, DEMO_RING) | (distance_km(LON, LAT, DEMO_RING) < 1e-3)
    speed = np.hypot(u.astype(float), v.astype(float))
    cd = (2.7 / np.maximum(speed, 0.5) + 0.142 + speed / 13.09) * 1e-3
    tx = (RHO_AIR * cd * speed * u).mean(axis=0)
    ty = (RHO_AIR * cd * speed * v).mean(axis=0)
    w = np.cos(np.radians(LAT))[wet]
    mean_tx = np.sum(tx[wet] * w) / np.sum(w)
    mean_ty = np.sum(ty[wet] * w) / np.sum(w)
    mean_speed = np.sum(speed.mean(axis=0)[wet] * w) / np.sum(w)
    print(f"demo: mean wind speed {mean_speed:.4f} m/s")
    print(f"demo: basin-mean stress (LY04) eastward {mean_tx:.6f} Pa, northward {mean_ty:.6f} Pa")
    print(f"demo: Sverdrup psi max (LY04): {sverdrup_max_sv(lon, lat, tx, ty, wet):.2f} Sv")


# ---------------------------------------------------------------- southern coast: Caradoc Sea (pressure)

SOUTH_RING = [(-136.0, -42.0), (-117.0, -42.0), (-116.2, -36.0), (-115.6, -31.0), (-116.4, -28.5),
              (-115.8, -25.0), (-115.2, -22.0), (-136.0, -22.0)]


def make_southern():
    out = HERE / "southern-coast"
    out.mkdir(exist_ok=True)
    geojson_polygon(out / "basin.geojson", "Caradoc Sea", [("Caradoc Sea", [SOUTH_RING])],
                    {"note": "invented basin, southern hemisphere"})
    lon = np.arange(-138.0, -112.0 + 1e-9, 1.0)
    lat = np.arange(-44.0, -20.0 + 1e-9, 1.0)
    days = 365
    LON, LAT = np.meshgrid(lon, lat)
    rng = np.random.default_rng(20210202)
    doy = np.arange(days) + 1.0
    slp = np.empty((days, len(lat), len(lon)), np.float32)
    noise = np.zeros((len(lat), len(lon)))
    for t in range(days):
        season = np.cos(2 * np.pi * (doy[t] - 15) / 365.0)         # +1 in January = austral summer
        # subtropical high offshore, moving poleward in summer; thermal low over the land to the east
        y0 = -31.0 - 3.0 * season
        high = 1400.0 * np.exp(-(((LON + 128.0) / 9.0) ** 2 + ((LAT - y0) / 7.0) ** 2))
        low = -(500.0 + 300.0 * season) * np.exp(-(((LON + 110.0) / 5.0) ** 2 + ((LAT + 30.0) / 10.0) ** 2))
        noise = 0.7 * noise + 0.7 * gaussian_filter(rng.standard_normal(noise.shape), 3.0, mode="nearest") * 600.0
        slp[t] = 101300.0 + high + low + noise
    with netcdf_file(out / "winds-slp.nc", "w", version=1) as nc:
        global_attrs(nc, "Caradoc Sea synthetic daily sea-level pressure")
        coords(nc, lon, lat, days, "days since 2021-01-01 00:00:00")
        packed(nc, "slp", ("time", "lat", "lon"), slp, "Pa", "air pressure at sea level",
               "air_pressure_at_mean_sea_level", scale=1.0, offset=100000.0)
    blon = np.arange(-137.0, -113.0 + 1e-9, 0.1)
    blat = np.arange(-43.0, -21.0 + 1e-9, 0.1)
    bathymetry(out / "bathymetry.nc", SOUTH_RING, [], blon, blat, title="Caradoc Sea synthetic bathymetry")


# ---------------------------------------------------------------- island and bay: Orlen Basin

ISLAND_RING = [(158.0, 24.0), (176.0, 24.0), (176.5, 30.0), (175.2, 31.0), (174.0, 32.5),
               (175.4, 34.0), (176.8, 35.0), (177.0, 42.0), (158.0, 42.0)]   # Brannoch Bay near 174-176E, 31-34N
ISLAND = [(164.0, 32.0), (166.0, 31.6), (166.6, 33.0), (165.0, 34.0), (163.8, 33.2)]   # Hask Island


def make_island_bay():
    out = HERE / "island-bay"
    out.mkdir(exist_ok=True)
    geojson_polygon(out / "basin.geojson", "Orlen Basin", [("Orlen Basin", [ISLAND_RING, ISLAND])],
                    {"note": "invented basin with Hask Island and Brannoch Bay"})
    lon = np.arange(156.0, 179.0 + 1e-9, 1.0)
    lat = np.arange(22.0, 44.0 + 1e-9, 1.0)
    days = 365
    LON, LAT = np.meshgrid(lon, lat)
    rng = np.random.default_rng(20210303)
    nu, nv = weather_noise(rng, days, len(lat), len(lon), amp=2.0, sigma_cells=1.5)
    doy = np.arange(days) + 1.0
    u = np.empty((days, len(lat), len(lon)), np.float32)
    v = np.empty_like(u)
    for t in range(days):
        season = np.cos(2 * np.pi * (doy[t] - 15) / 365.0)
        phase = np.pi * (LAT - 24.0) / 18.0
        u[t] = -6.5 * np.cos(phase) + nu[t]
        v[t] = -(4.0 - 3.0 * season) * np.exp(-((LON - 177.0) / 4.0) ** 2) + nv[t]
    with netcdf_file(out / "winds.nc", "w", version=1) as nc:
        global_attrs(nc, "Orlen Basin synthetic daily 10 m winds")
        coords(nc, lon, lat, days, "days since 2021-01-01 00:00:00")
        packed(nc, "uwnd", ("time", "lat", "lon"), u, "m s-1", "eastward wind at 10 m", "eastward_wind")
        packed(nc, "vwnd", ("time", "lat", "lon"), v, "m s-1", "northward wind at 10 m", "northward_wind")
    blon = np.arange(157.0, 178.0 + 1e-9, 0.1)
    blat = np.arange(23.0, 43.0 + 1e-9, 0.1)
    bathymetry(out / "bathymetry.nc", ISLAND_RING, [ISLAND], blon, blat, title="Orlen Basin synthetic bathymetry")


if __name__ == "__main__":
    wanted = set(sys.argv[1:]) or {"demo", "southern", "island"}
    if "demo" in wanted:
        make_demo()
    if "southern" in wanted:
        make_southern()
    if "island" in wanted:
        make_island_bay()
