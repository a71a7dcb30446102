#!/usr/bin/env bash
# npm run bench: the Node benches (vitest bench), then a fresh build, the gzipped JavaScript the
# shelf check route loads, the browser bench (span input to screen in Chromium), Lighthouse's mobile
# scores of the shelf check anyone can try (tests/bench/lighthouse.ts), and the compute API against
# a bare node:http server (tests/bench/api/api.ts).
# The engine rows of issue 12 (solvers, analysis, case check beside their goals and plain
# closed-form loops) come from tests/bench/engine-rows.ts; its list rows (a project's analyses at 200 and
# 10,000) from tests/bench/list-rows.ts.
# It starts with the count of published figures still marked "from memory" or "unverified"
# (tests/bench/unverified.ts). Benchmarks report; they never fail on a slow number.
# One run at a time on a machine, shared with the e2e runner: the build folder is shared.
set -euo pipefail
cd "$(dirname "$0")/../.."
npx tsx tests/bench/unverified.ts
bash tests/e2e/support/ensure-chromium.sh
exec 9>/tmp/spanwright-e2e.lock
flock 9
npx vitest bench --run
bash tests/bench/engine-rows.sh
npx tsx tests/bench/list-rows.ts
# the same rows on PostgreSQL, in a throwaway cluster
bash tests/support/with-postgres.sh npx tsx tests/bench/list-rows.ts
npx vite build --logLevel warn
npx tsx tests/bench/route-size.ts
npx tsx tests/bench/browser/shelf-input.ts
npx tsx tests/bench/lighthouse.ts
npx tsx tests/bench/api/api.ts
