#!/usr/bin/env bash
# Runs the Tycho build with Maven 3.9 (fetched by coordinates on first use, see releng/maven.sh).
# All arguments go to Maven, e.g.
#   releng/build.sh verify                                   # everything, with tests
#   releng/build.sh -pl bundles/eluvia.cost,tests/eluvia.cost.tests verify
#   releng/build.sh -DskipTests verify                       # the product without running tests
# UI tests need a display: use releng/test-all.sh, which provides one with Xvfb.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
top="$(dirname "$here")"
mvn39="$("$here/maven.sh")"
cd "$top"
if [ $# -eq 0 ]; then set -- verify; fi
exec "$mvn39" -B "$@"
