#!/usr/bin/env bash
# npm run dev: API server with reload on :3000 and Vite's dev server on :5173 in front of it.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
ensure_deps
ensure_db
migrate
node --import tsx scripts/seed.ts
node --import tsx --watch server/index.ts &
api_pid=$!
trap 'kill $api_pid 2>/dev/null' EXIT
say "open http://127.0.0.1:5173"
npx vite --host 127.0.0.1
