#!/usr/bin/env bash
# npm test: bootstrap (deps, PostgreSQL test cluster, Chromium) then every suite; non-zero on any failure.
set -uo pipefail
cd "$(dirname "$0")/.."
source scripts/ensure-deps.sh || exit 1
bash scripts/install-test-tools.sh || exit 1
CLUSTER=test DB_NAME=app_test bash scripts/pg-up.sh || exit 1

mkdir -p test-output
failed_steps=()
run_step() {
  local name=$1; shift
  echo "== $name"
  "$@" || failed_steps+=("$name")
}

run_step type-check npx vue-tsc --noEmit -p tsconfig.json
run_step lint npx eslint . --max-warnings=0
run_step build env NODE_ENV=production npx vite build --logLevel warn
run_step unit+api npx vitest run --project node --project web --reporter=default --reporter=json --outputFile.json=test-output/vitest-main.json
run_step e2e npx vitest run --project e2e --reporter=default --reporter=json --outputFile.json=test-output/vitest-e2e.json
# Last: this suite stops and restarts the test cluster, so nothing may run beside it.
run_step late npx vitest run --project late --reporter=default --reporter=json --outputFile.json=test-output/vitest-late.json

node scripts/summarise-tests.mjs test-output/vitest-main.json test-output/vitest-e2e.json test-output/vitest-late.json
if [ ${#failed_steps[@]} -gt 0 ]; then
  echo "Failed: ${failed_steps[*]}"
  exit 1
fi
