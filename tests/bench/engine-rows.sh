#!/usr/bin/env bash
# The engine rows of issue 12 (tests/bench/engine-rows.ts), bundled as the app's build bundles the
# engine, then run by plain Node.
set -euo pipefail
cd "$(dirname "$0")/../.."
mkdir -p tests/.tmp
npx esbuild tests/bench/engine-rows.ts --bundle --platform=node --format=esm --log-level=warning \
	--outfile=tests/.tmp/engine-rows.mjs
node tests/.tmp/engine-rows.mjs
