#!/usr/bin/env bash
# npm run bench: prints the performance figures (engine, PDF, and the workspace in chromium).
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
ensure_deps
for bench in scripts/bench-engine.ts scripts/bench-pdf.ts; do
  if [ -f "$bench" ]; then say "$bench"; node --import tsx "$bench"; fi
done
if [ -f scripts/bench-ui.ts ]; then
  ensure_db
  migrate
  node --import tsx scripts/seed.ts
  say "building the client"
  npx vite build --logLevel warn
  say "scripts/bench-ui.ts"
  node --import tsx scripts/bench-ui.ts
fi
