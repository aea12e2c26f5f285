#!/usr/bin/env bash
# npm test: the same set-up as npm start on test ports and the test database
# (recreated each run), then lint → typecheck → vitest → next build → Playwright in
# Debian's Chromium, and a closing "N passed, N failed" line. Non-zero on any failure.
source "$(dirname "${BASH_SOURCE[0]}")/common.sh"

APP_PORT="${TEST_PORT:-3100}"
SMTP="${TEST_SMTP_PORT:-2625}"
MAILBOX="${TEST_MAILBOX_PORT:-2680}"
REPORTS=test-results/reports
STARTED_AT=$(date +%s)
declare -a FAILED_STEPS=()
# Developers may skip steps while iterating: npm test -- --skip=lint,typecheck,vitest
SKIP=","
for a in "$@"; do case "$a" in --skip=*) SKIP=",${a#--skip=},";; *) fail "unknown option $a (known: --skip=lint,typecheck,vitest,build,playwright)";; esac; done

trap 'cleanup; exit 130' INT TERM
trap cleanup EXIT

step() {
  local name="$1"; shift
  if [[ "$SKIP" == *",$name,"* ]]; then log "── $name: skipped (--skip)"; return; fi
  local t0; t0=$(date +%s)
  log "── $name"
  if "$@"; then log "   $name: ok ($(( $(date +%s) - t0 )) s)"; else log "   $name: FAILED ($(( $(date +%s) - t0 )) s)"; FAILED_STEPS+=("$name"); fi
}

ensure_node_modules
ensure_chromium
start_db
bash db/mariadb.sh reset-db probity_test
app_env probity_test "$APP_PORT" "$SMTP" "$MAILBOX"
export PROBITY_DB_TESTS=required E2E_BASE_URL="$NEXTAUTH_URL"
npx tsx db/migrate.ts
npx tsx db/seed.ts
start_mail_fake "$SMTP" "$MAILBOX"
rm -rf "$REPORTS" && mkdir -p "$REPORTS"

step lint npm run --silent lint
step typecheck npm run --silent typecheck
step vitest npx vitest run --reporter=default --reporter=json --outputFile.json="$REPORTS/vitest.json"
step build bash -c "npx next build > $REPORTS/next-build.log 2>&1 || { tail -n 60 $REPORTS/next-build.log; exit 1; }"
if [[ ! " ${FAILED_STEPS[*]} " =~ " build " ]]; then
  start_app "$APP_PORT"
  step playwright npx playwright test
fi

log "finished in $(( $(date +%s) - STARTED_AT )) s"
node lib/tasks/summary.mjs "$REPORTS" "${FAILED_STEPS[@]}"
