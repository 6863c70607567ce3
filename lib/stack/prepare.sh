#!/usr/bin/env bash
# Installs what Foldwright needs on a fresh Debian 12 machine before `npm start` / `npm test`:
# Debian packages with apt-get (root only) and npm packages from the lock file.
set -euo pipefail
mode="${1:-start}"
cd "$(dirname "$0")/../.."

need=()
# Both the server and its data-directory tool: a half-removed install has one without the other.
{ [ -x /usr/sbin/mariadbd ] || command -v mariadbd >/dev/null 2>&1; } && command -v mariadb-install-db >/dev/null 2>&1 || need+=(mariadb-server)
if [ "$mode" = "test" ]; then
  command -v chromium >/dev/null 2>&1 || need+=(chromium)
  command -v qpdf >/dev/null 2>&1 || need+=(qpdf)
  # Debian's python3 (not a pyenv one on PATH), and a real import: a bare "import sklearn" can
  # pass on the leftovers of a removed package.
  /usr/bin/python3 -c 'from sklearn.linear_model import LogisticRegression' >/dev/null 2>&1 || need+=(python3-sklearn)
fi

if [ ${#need[@]} -gt 0 ]; then
  cmd="apt-get update && DEBIAN_FRONTEND=noninteractive apt-get install -y --no-install-recommends ${need[*]}"
  if [ "$(id -u)" != "0" ]; then
    echo "Foldwright needs these Debian packages: ${need[*]}" >&2
    echo "Run this as root, then start again:" >&2
    echo "  $cmd" >&2
    exit 1
  fi
  echo "Installing Debian packages: ${need[*]}"
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${need[@]}" >/dev/null
fi

# npm packages exactly as locked; reinstall when the lock file changed since the last install.
if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "Installing npm packages from package-lock.json"
  npm ci --no-audit --no-fund
fi
