#!/usr/bin/env bash
# Runs every test of Gyreplan on a fresh Debian machine with Java 17 and Maven.
# It installs what the tests need (Debian packages for the real-client checks,
# the open NOAA datasets of Debian's ferret-datasets package) and then runs Maven.
set -euo pipefail
cd "$(dirname "$0")/.."
bash tools/fetch-test-deps.sh
mvn -B -ntp verify "$@"
