#!/usr/bin/env bash
# npm test — installs what is missing, starts PostgreSQL, creates a fresh test database, then runs the
# type check, lint, unit, integration and browser suites. Every suite runs; the exit code is non-zero if any failed.
source "$(dirname "$0")/lib.sh"
ensure_chromium
ensure_node_modules
source "$ROOT/scripts/test-env.sh"
recreate_database "$TEST_DB" >/dev/null
T="$MITERWISE_DATA_DIR"
rm -rf "$T"; mkdir -p "$T/results"
cd "$ROOT"

failed=()
run() { # name, command…
  local name="$1"; shift
  say "$name"
  local start=$SECONDS
  if "$@"; then echo "  ($name: $((SECONDS - start)) s)"; else failed+=("$name"); fi
}

run "type check" npx tsc --noEmit -p .
run "lint" npx eslint . # errors fail the run; warnings are shown
run "unit tests" npx vitest run --project unit --reporter=default --reporter=json --outputFile.json="$T/results/unit.json"
run "integration tests" npx vitest run --project integration --reporter=default --reporter=json --outputFile.json="$T/results/integration.json"
run "production build" bash -c 'npx next build >"$MITERWISE_DATA_DIR/build.log" 2>&1 || { tail -n 40 "$MITERWISE_DATA_DIR/build.log"; exit 1; }'
PLAYWRIGHT_JSON_OUTPUT_NAME="$T/results/browser.json" run "browser tests" npx playwright test --reporter=list,json

# Leave the machine as we found it: stop PostgreSQL if this run started it.
if [ -n "${PG_STARTED_HERE:-}" ]; then pg_down; fi
node scripts/test-summary.mjs "$T/results" "${#failed[@]}"
if [ "${#failed[@]}" -gt 0 ]; then
  printf '\033[1;31m✗\033[0m failed: %s\n' "${failed[*]}" >&2
  exit 1
fi
