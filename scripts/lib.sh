#!/usr/bin/env bash
# Shared set-up for npm start / npm test: dependencies, the private MariaDB, migrations.
set -euo pipefail
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$ROOT"

say() { printf '\033[1m[knitwright]\033[0m %s\n' "$*"; }

apt_install() {
  if [ "$(id -u)" -ne 0 ]; then say "please install with: sudo apt-get install $*"; return 1; fi
  export DEBIAN_FRONTEND=noninteractive
  if [ -z "${KW_APT_UPDATED:-}" ]; then apt-get update -qq; export KW_APT_UPDATED=1; fi
  apt-get install -y -qq "$@" >/dev/null
}

# npm ci when node_modules is missing or older than the lock file.
ensure_deps() {
  local stamp="node_modules/.kw-lock-hash" want
  want="$(sha256sum package-lock.json | cut -d' ' -f1)"
  if [ -f "$stamp" ] && [ "$(cat "$stamp")" = "$want" ]; then return; fi
  say "installing npm dependencies (npm ci)"
  npm ci --no-audit --no-fund --loglevel=error
  echo "$want" >"$stamp"
}

ensure_db() { bash "$ROOT/scripts/db.sh" start; }

migrate() { node --import tsx "$ROOT/scripts/migrate.ts"; }
