#!/usr/bin/env bash
# Installs the Debian packages the test suites need, only when they are missing: chromium (browser
# tests), python3 (tests/contract/cli-shape.py) and postgresql (the API suite on PostgreSQL, in a
# throwaway cluster started by scripts/pg-cluster.mjs) and haproxy (the two-instance test in
# tests/multi-instance runs deploy/haproxy.cfg in front of two API processes). The scipy/statsmodels reference answers are
# committed fixtures (tests/reference/fixtures); only `npm run reference:regen -w @waymark/tests`,
# which regenerates them, needs python3-scipy and python3-statsmodels.
set -euo pipefail

need=()
[ -x /usr/bin/chromium ] || need+=(chromium)
[ -x /usr/bin/python3 ] || need+=(python3)
compgen -G "/usr/lib/postgresql/*/bin/initdb" >/dev/null || need+=(postgresql)
command -v haproxy >/dev/null 2>&1 || [ -x /usr/sbin/haproxy ] || need+=(haproxy)
if [ "${1:-}" = "--reference" ]; then
  /usr/bin/python3 -c "import scipy" 2>/dev/null || need+=(python3-scipy)
  /usr/bin/python3 -c "import statsmodels" 2>/dev/null || need+=(python3-statsmodels)
fi

if [ ${#need[@]} -eq 0 ]; then
  echo "system packages: all present"
  exit 0
fi

echo "system packages: installing ${need[*]}"
SUDO=""
if [ "$(id -u)" -ne 0 ]; then
  if command -v sudo >/dev/null 2>&1; then SUDO="sudo"; else
    echo "Missing ${need[*]}; run as root or install them: apt-get install -y ${need[*]}" >&2
    exit 1
  fi
fi
export DEBIAN_FRONTEND=noninteractive
$SUDO apt-get update -q || true
$SUDO apt-get install -y -q "${need[@]}"
