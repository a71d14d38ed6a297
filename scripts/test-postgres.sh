#!/usr/bin/env bash
# `npm run test:postgres`: the repository and route suites against PostgreSQL. Starts a throwaway cluster
# from Debian's postgresql 15 (initdb in a temp folder, as the `postgres` user when run as root, because
# initdb refuses root; socket in that folder, a free port, no TCP), runs the suites that touch the database
# with DATABASE_URL pointing at it (each test file makes databases of its own), then stops the cluster and
# removes the folder, also when a test fails or the run is interrupted.
# Extra arguments go to vitest (e.g. a single file).
set -euo pipefail
cd "$(dirname "$0")/.."

PGBIN=${PGBIN:-/usr/lib/postgresql/15/bin}
if [[ ! -x "$PGBIN/initdb" ]]; then
  echo "PostgreSQL 15 is not installed ($PGBIN/initdb is missing). Install Debian's package as root: apt-get install -y postgresql" >&2
  exit 1
fi

DIR=$(mktemp -d "${TMPDIR:-/tmp}/arcline-pg-XXXXXX")
if [[ "$(id -u)" == 0 ]]; then
  chown postgres "$DIR"
  as_pg() { runuser -u postgres -- "$@"; }
else
  as_pg() { "$@"; }
fi

started=0
tests=
cleanup() {
  local rc=$?
  # vitest and its workers, as one process group (setsid below).
  if [[ -n "$tests" ]] && kill -0 "$tests" 2>/dev/null; then kill -TERM -- "-$tests" 2>/dev/null || true; sleep 1; kill -KILL -- "-$tests" 2>/dev/null || true; fi
  if ((started)); then as_pg "$PGBIN/pg_ctl" -D "$DIR/data" -m immediate -w stop >/dev/null 2>&1 || true; fi
  if ((rc != 0)) && [[ -f "$DIR/log" ]]; then echo "--- last lines of the PostgreSQL log" >&2; tail -n 20 "$DIR/log" >&2 || true; fi
  rm -rf "$DIR"
  exit "$rc"
}
trap cleanup EXIT
trap 'exit 130' INT TERM

PORT=$(node scripts/free-port.mjs)
# C.UTF-8: code-point order for text, as SQLite's BINARY collation, and Unicode letters for the text search.
as_pg "$PGBIN/initdb" -D "$DIR/data" -A trust -U arcline -E UTF8 --locale=C.UTF-8 >/dev/null
# A throwaway cluster: durability settings off (the suites test behaviour, not power cuts).
as_pg "$PGBIN/pg_ctl" -D "$DIR/data" -l "$DIR/log" -w -o "-p $PORT -k $DIR -c listen_addresses='' -c fsync=off -c synchronous_commit=off -c full_page_writes=off -c max_connections=200" start >/dev/null
started=1
echo "PostgreSQL $("$PGBIN/postgres" --version | awk '{print $3}') on socket $DIR, port $PORT"

if (($#)); then
  files=("$@")
else
  # Every vitest suite that reaches the database (a repository, a route, or the test database helpers), except
  # the ones about SQLite itself (another process holding the SQLite write lock) and the layering check
  # (it reads source files, not the database).
  mapfile -t files < <(grep -rlE "from '@/(db|tests/setup/(db|template-db|route-matrix|fixtures))['/]" tests --include='*.test.ts' | grep -v -e 'tests/e2e/' -e 'tests/unit/security/contention.test.ts' -e 'tests/unit/layers.test.ts' | sort)
fi
echo "${#files[@]} suites"
# In its own process group, in the background and waited for: an interrupt or TERM reaches the trap at once,
# which ends vitest with its workers and still removes the cluster.
DATABASE_URL="postgresql://arcline@localhost:$PORT/postgres?host=$DIR" setsid npx vitest run "${files[@]}" &
tests=$!
wait "$tests"
