#!/usr/bin/env bash
# Installs the Debian packages the tests use as real clients (GDAL, ncdump/nccopy,
# headless Chromium, Python/NumPy/SciPy for the side-by-side references) and unpacks
# the NOAA open datasets from Debian's ferret-datasets package into a cache we control
# (no viewer program is installed or run). Safe to run more than once.
set -euo pipefail
SUDO=""
if [ "$(id -u)" != "0" ]; then SUDO="sudo"; fi
need=()
command -v gdalinfo  >/dev/null 2>&1 || need+=(gdal-bin)
command -v ncdump    >/dev/null 2>&1 || need+=(netcdf-bin)
command -v chromium  >/dev/null 2>&1 || need+=(chromium)
/usr/bin/python3 -c 'import numpy, scipy' >/dev/null 2>&1 || need+=(python3-numpy python3-scipy)
dpkg -s fonts-dejavu-core >/dev/null 2>&1 || need+=(fonts-dejavu-core)
if [ ${#need[@]} -gt 0 ]; then
  echo "[gyreplan] installing Debian packages: ${need[*]}"
  $SUDO apt-get update -qq
  DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq --no-install-recommends "${need[@]}" >/dev/null
fi
CACHE="${GYREPLAN_DATA_CACHE:-$HOME/.cache/gyreplan}"
DATA="$CACHE/ferret-datasets"
if [ ! -f "$DATA/.complete" ]; then
  echo "[gyreplan] fetching open datasets (Debian ferret-datasets) into $DATA"
  mkdir -p "$CACHE/deb"
  ( cd "$CACHE/deb" && { ls ferret-datasets_*.deb >/dev/null 2>&1 || apt-get download ferret-datasets || { $SUDO apt-get update -qq && apt-get download ferret-datasets; }; } )
  rm -rf "$DATA.tmp" && mkdir -p "$DATA.tmp"
  dpkg -x "$CACHE"/deb/ferret-datasets_*.deb "$DATA.tmp"
  rm -rf "$DATA" && mv "$DATA.tmp" "$DATA"
  touch "$DATA/.complete"
fi
echo "[gyreplan] open datasets: $(find "$DATA" -name '*.cdf' | head -1 | xargs dirname)"
