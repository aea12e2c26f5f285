#!/usr/bin/env bash
# npm start: install what is missing, start MariaDB and the mail fake, migrate, seed,
# build, serve on http://127.0.0.1:${PORT:-3000}. Ctrl-C stops what this started.
source "$(dirname "${BASH_SOURCE[0]}")/common.sh"

APP_PORT="${PORT:-3000}"
SMTP="${SMTP_PORT:-2525}"
MAILBOX="${MAILBOX_PORT:-2580}"

trap 'echo; log "stopping"; cleanup; exit 0' INT TERM
trap cleanup EXIT

ensure_node_modules
start_db
bash db/mariadb.sh create-db probity
app_env probity "$APP_PORT" "$SMTP" "$MAILBOX"
npx tsx db/migrate.ts
npx tsx db/seed.ts
start_mail_fake "$SMTP" "$MAILBOX"
log "building (next build)"
npx next build > .data/next-build.log 2>&1 || { tail -n 40 .data/next-build.log >&2; fail "next build failed; see .data/next-build.log"; }
start_app "$APP_PORT"

cat <<MSG

  Probity is running at  http://127.0.0.1:${APP_PORT}
  Mailbox (fake SMTP):   http://127.0.0.1:${MAILBOX}

  Demo sign-ins (password for all: probity-demo)
    admin       ada.quint@fernhollow.example
    programmer  piet.marlowe@fernhollow.example
    engineer    elena.voss@fernhollow.example
    reviewer    rafael.okoro@fernhollow.example
    setup       sam.tierney@fernhollow.example
    programmer + reviewer   mira.lund@fernhollow.example
    second workspace admin  jonas.hale@stonebridge.example

  Generated programs must be proven out before use: single block, reduced rapid
  and feed override, clearance checked. The machine builder's instructions and
  local rules come first.

  Press Ctrl-C to stop.
MSG
wait "$APP_PID"
