#!/usr/bin/env bash
# First step of `npm start`, `npm run dev` and `npm test`: make sure what the project
# needs is on the machine. Packages come from the npm registry (npm ci) and
# Debian's archive (apt-get); nothing else is downloaded.
set -euo pipefail
cd "$(dirname "$0")/../.."

need_root() {
  echo "Pinwright needs Debian's '$1' package, and this user cannot install it."
  echo "Run:  sudo apt-get update && sudo DEBIAN_FRONTEND=noninteractive apt-get install -y --no-install-recommends $2"
  echo "then run the command again."
  exit 1
}

apt_install() { # $1 = command to look for, $2 = packages
  if command -v "$1" >/dev/null 2>&1 || [ -x "/usr/sbin/$1" ]; then return; fi
  if [ "$(id -u)" != "0" ]; then need_root "$1" "$2"; fi
  echo "Installing $2 from Debian's packages…"
  if [ -z "${PINWRIGHT_APT_UPDATED:-}" ]; then apt-get update -qq; export PINWRIGHT_APT_UPDATED=1; fi
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends $2 >/dev/null
}

# 1. npm packages: install when node_modules is missing or older than the lock.
lock_sum=$(sha256sum package-lock.json | cut -d' ' -f1)
if [ ! -f node_modules/.pinwright-lock ] || [ "$(cat node_modules/.pinwright-lock)" != "$lock_sum" ]; then
  echo "Installing npm packages (npm ci)…"
  npm ci --no-audit --no-fund --loglevel=error
  echo "$lock_sum" > node_modules/.pinwright-lock
fi

# 2. The database server (MariaDB from Debian; the core packages are enough).
apt_install mariadbd "mariadb-server-core mariadb-client-core"

# 3. For the test command only: Chromium for the browser tests.
if [ "${1:-}" = "--browser" ]; then
  apt_install chromium "chromium fonts-dejavu-core"
fi
