#!/usr/bin/env bash
# Prints the path of a Maven 3.9 executable, fetching Maven by its coordinates through the
# system Maven the first time (Tycho 4 needs Maven 3.9; Debian 12 ships 3.8.7).
# The copy lives in ~/.cache/eluvia (or $ELUVIA_CACHE), never in the repository.
set -euo pipefail
version=3.9.16
cache="${ELUVIA_CACHE:-$HOME/.cache/eluvia}"
mvn39="$cache/apache-maven-$version/bin/mvn"
if [ ! -x "$mvn39" ]; then
  if ! command -v mvn >/dev/null 2>&1; then
    echo "releng/maven.sh: no 'mvn' on PATH to fetch Maven $version with; install it: apt-get install -y maven" >&2
    exit 1
  fi
  mkdir -p "$cache"
  mvn -q -B org.apache.maven.plugins:maven-dependency-plugin:3.8.1:copy \
      -Dartifact=org.apache.maven:apache-maven:$version:zip:bin -DoutputDirectory="$cache" >&2
  if command -v unzip >/dev/null 2>&1; then
    (cd "$cache" && unzip -q -o "apache-maven-$version-bin.zip")
  else
    # the JDK's jar tool unpacks zip files too (it does not keep the execute bit)
    (cd "$cache" && jar xf "apache-maven-$version-bin.zip" && chmod +x "apache-maven-$version/bin/mvn")
  fi
fi
echo "$mvn39"
