#!/usr/bin/env bash
# Builds the app and serves it against a freshly migrated and seeded e2e database.
set -euo pipefail
cd "$(dirname "$0")/.."
rm -f "$DATABASE_FILE" "$DATABASE_FILE-wal" "$DATABASE_FILE-shm"
rm -rf "$UPLOAD_DIR"
npx tsx db/seed.ts
# One build at a time on this machine: parallel worktrees share two cores (flock is in util-linux).
if [ "${E2E_SKIP_BUILD:-}" != "1" ]; then flock /tmp/arcline-next-build.lock npx next build; fi
exec npx next start -H 127.0.0.1 -p "$E2E_PORT"
