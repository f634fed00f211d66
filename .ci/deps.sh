#!/usr/bin/env bash
# Installs the Debian packages the tests read outputs with, when they are missing.
# Runs as root on CI and on the developers' machines; elsewhere it only reports.
set -euo pipefail
missing=()
for p in "$@"; do
  dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q "install ok installed" || missing+=("$p")
done
if [ ${#missing[@]} -eq 0 ]; then exit 0; fi
if [ "$(id -u)" -ne 0 ]; then
  echo "deps: missing Debian packages: ${missing[*]} (install them with apt-get as root)" >&2
  exit 0
fi
echo "deps: installing ${missing[*]}"
export DEBIAN_FRONTEND=noninteractive
apt-get update -qq >/dev/null
apt-get install -y -qq "${missing[@]}" >/dev/null
