#!/usr/bin/env bash
# `npm test`: the whole gate, in order. Typecheck, lint, the layering rules, then the unit suites (on SQLite,
# then the database suites again on a throwaway PostgreSQL cluster) and the end-to-end suites.
# As root it first installs the Debian packages the suites use; otherwise it names the missing ones and stops.
set -euo pipefail
cd "$(dirname "$0")/.."

# command -> Debian package: Chromium drives the e2e suite, poppler reads PDFs in tests, PostgreSQL 15 runs the
# database suites a second time (scripts/test-postgres.sh).
declare -A NEEDS=([/usr/bin/chromium]=chromium [pdftotext]=poppler-utils [/usr/lib/postgresql/15/bin/initdb]=postgresql)
missing=()
for probe in "${!NEEDS[@]}"; do
  if [[ "$probe" == /* ]]; then [[ -e "$probe" ]] || missing+=("${NEEDS[$probe]}")
  else command -v "$probe" >/dev/null 2>&1 || missing+=("${NEEDS[$probe]}"); fi
done
if ((${#missing[@]})); then
  if [[ "$(id -u)" == 0 ]]; then
    echo "Installing Debian packages: ${missing[*]}"
    apt-get update -qq
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${missing[@]}"
  else
    echo "Missing Debian packages: ${missing[*]}. Install them as root: apt-get install -y ${missing[*]}" >&2
    exit 1
  fi
fi

# The gate picks its databases itself: SQLite files for the unit and e2e suites, a throwaway PostgreSQL cluster
# for test:postgres. A DATABASE_URL left in the shell must not send the suites to some other database.
unset DATABASE_URL

step() { echo; echo "== $1"; }
step "typecheck (tsc --noEmit)"; npm run --silent typecheck
step "lint (eslint)"; npm run --silent lint
step "layers (dependency-cruiser)"; npm run --silent lint:deps
step "unit suites (vitest)"; npm run --silent test:unit
step "database suites on PostgreSQL (vitest)"; npm run --silent test:postgres
step "end-to-end suites (playwright)"; npm run --silent test:e2e
