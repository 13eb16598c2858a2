#!/usr/bin/env bash
# Builds everything and runs every test, UI tests included, on a fresh Debian 12 machine:
# installs Xvfb and GTK 3 when they are missing (needs root or sudo), fetches Maven 3.9 by its
# coordinates, and runs the full Tycho verify under a virtual display.
# Extra arguments go to Maven (e.g. -o for offline).
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"

need=()
command -v xvfb-run >/dev/null 2>&1 || need+=(xvfb xauth)
[ -e /usr/lib/x86_64-linux-gnu/libgtk-3.so.0 ] || need+=(libgtk-3-0)
command -v unzip >/dev/null 2>&1 || need+=(unzip)
command -v mvn >/dev/null 2>&1 || need+=(maven)
if [ ${#need[@]} -gt 0 ]; then
  echo "releng/test-all.sh: installing ${need[*]} with apt-get" >&2
  sudo_cmd=""
  [ "$(id -u)" -eq 0 ] || sudo_cmd="sudo"
  $sudo_cmd apt-get update -qq
  DEBIAN_FRONTEND=noninteractive $sudo_cmd apt-get install -y -qq --no-install-recommends "${need[@]}" >/dev/null
fi

export NO_AT_BRIDGE=1
export SWT_GTK3=1
# Fetch Maven first, outside the virtual display, so that its messages are not mixed in.
"$here/maven.sh" >/dev/null
exec xvfb-run -a -s "-screen 0 1280x1024x24" "$here/build.sh" verify "$@"
