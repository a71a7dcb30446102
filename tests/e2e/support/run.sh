#!/usr/bin/env bash
# npm run test:e2e [-- playwright args]: Chromium when missing, a fresh build, then the journeys.
# One run at a time on a machine (several people may share it): the build folder is shared.
set -euo pipefail
cd "$(dirname "$0")/../../.."
bash tests/e2e/support/ensure-chromium.sh
bash tests/support/ensure-poppler.sh
exec 9>/tmp/spanwright-e2e.lock
flock 9
npx vite build --logLevel warn
npx playwright test -c tests/playwright.config.ts "$@"
