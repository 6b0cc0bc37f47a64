#!/usr/bin/env bash
# npm start: everything from a fresh machine to a running studio app.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"

ensure_deps
ensure_db
migrate
node --import tsx scripts/seed.ts
say "building the client"
npx vite build --logLevel warn
export NODE_ENV=production KW_LOCAL_PRODUCTION=1 SERVE_CLIENT=1
export SECURE_COOKIES="${SECURE_COOKIES:-0}"
PORT="${PORT:-3000}"
say "Knitwright: http://127.0.0.1:$PORT"
say "demo sign-in: owner ada@loopandlark.example / knit-demo-owner · cutter rowan@loopandlark.example / knit-demo-cutter"
exec node --import tsx server/index.ts
