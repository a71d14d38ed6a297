#!/usr/bin/env bash
# Builds the app and serves it against a freshly migrated and seeded e2e database.
set -euo pipefail
cd "$(dirname "$0")/.."
# The e2e server always runs on its own SQLite file (DATABASE_FILE), whatever DATABASE_URL the shell has.
unset DATABASE_URL
rm -f "$DATABASE_FILE" "$DATABASE_FILE-wal" "$DATABASE_FILE-shm"
rm -rf "$UPLOAD_DIR"
npx tsx db/seed.ts
# E-mail: a local fake SMTP server (messages kept as .eml files in MAIL_DIR) for the life of this server.
if [ -n "${FAKE_SMTP_PORT:-}" ] && [ -z "${SMTP_URL:-}" ]; then
  rm -rf "$MAIL_DIR"
  npx tsx scripts/fake-smtp.ts &
  export SMTP_URL="smtp://127.0.0.1:$FAKE_SMTP_PORT"
fi
# One build at a time on this machine: parallel worktrees share two cores (flock is in util-linux).
if [ "${E2E_SKIP_BUILD:-}" != "1" ]; then flock /tmp/arcline-next-build.lock npx next build; fi
exec npx next start -H 127.0.0.1 -p "$E2E_PORT"
