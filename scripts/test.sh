#!/usr/bin/env bash
# npm test: the same set-up as npm start against the test database, then every check.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"

export NODE_ENV=test
export DB_NAME="${DB_TEST_NAME:-knitwright_test}"
export KW_SKIP_E2E="${KW_SKIP_E2E:-}"

ensure_deps
if ! command -v chromium >/dev/null 2>&1; then say "installing Debian's chromium for end-to-end tests"; apt_install chromium; fi
if ! command -v pdftoppm >/dev/null 2>&1; then say "installing poppler-utils (pdftoppm) for print checks"; apt_install poppler-utils; fi
ensure_db
migrate
rm -f .run/vitest-unit.json .run/vitest-e2e.json

status=0
run() {
  local name="$1"; shift
  say "$name"
  if ! "$@"; then say "FAILED: $name"; status=1; fi
}

run "lint" npx eslint . --max-warnings=0
run "typecheck" npx tsc -p tsconfig.json --noEmit
run "unit and integration tests" npx vitest run --reporter=default --reporter=json --outputFile.json=.run/vitest-unit.json
if [ -z "$KW_SKIP_E2E" ]; then
  say "building the client for end-to-end tests"
  npx vite build --logLevel warn || status=1
  run "end-to-end tests" npx vitest run --config vitest.e2e.config.ts --reporter=default --reporter=json --outputFile.json=.run/vitest-e2e.json
fi

# One plain closing line for every runner together.
node -e '
const fs = require("fs");
let passed = 0, failed = 0, skipped = 0;
for (const f of [".run/vitest-unit.json", ".run/vitest-e2e.json"]) {
  if (!fs.existsSync(f)) continue;
  const r = JSON.parse(fs.readFileSync(f, "utf8"));
  passed += r.numPassedTests; failed += r.numFailedTests; skipped += r.numPendingTests + (r.numTodoTests || 0);
}
console.log(`${passed} passed, ${failed} failed, ${skipped} skipped`);
'
if [ "$status" -ne 0 ]; then say "some checks failed"; exit 1; fi
say "all checks passed"
