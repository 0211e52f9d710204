#!/usr/bin/env bash
# Every test: type checks, lint, unit and reference checks, then browser flows in Chromium.
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure-chromium.sh
npm run --silent check
npm run --silent lint
npx vitest run
npx playwright test
