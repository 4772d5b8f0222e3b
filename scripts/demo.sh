#!/usr/bin/env bash
# npm run demo — install when needed, migrate, seed the demo studio, build when stale, serve on :3000.
set -euo pipefail
cd "$(dirname "$0")/.."
export NEXT_TELEMETRY_DISABLED=1
PORT="${PORT:-3000}"

if [ ! -x node_modules/.bin/next ]; then
  echo "Installing dependencies…"
  if [ -f package-lock.json ]; then npm ci; else npm install; fi
fi

mkdir -p data
export DATABASE_URL="${DATABASE_URL:-file:./data/knotwork.db}"
export BETTER_AUTH_URL="${BETTER_AUTH_URL:-http://localhost:${PORT}}"
if [ -z "${BETTER_AUTH_SECRET:-}" ]; then
  # A random secret for this machine's demo, kept in the git-ignored data/ folder.
  if [ ! -s data/.auth-secret ]; then
    node -e 'process.stdout.write(require("crypto").randomBytes(32).toString("base64url"))' > data/.auth-secret
  fi
  BETTER_AUTH_SECRET="$(cat data/.auth-secret)"
  export BETTER_AUTH_SECRET
fi

node scripts/copy-samples.mjs

echo "Applying migrations and seeding the demo studio…"
npx tsx scripts/db-seed.ts

stale=0
if [ ! -f .next/BUILD_ID ]; then
  stale=1
elif [ -n "$(find app components db lib public proxy.ts next.config.ts package.json postcss.config.mjs \
      -newer .next/BUILD_ID -type f -not -path 'db/migrations/meta/*' 2>/dev/null | head -n 1)" ]; then
  stale=1
fi
# The heavy-work worker bundle (lib/jobs/worker.ts → build/worker/heavy-work.cjs), always: under a second.
node scripts/build-worker.mjs
if [ "$stale" = 1 ]; then
  echo "Building Knotwork (first run or sources changed; this takes a few minutes)…"
  npx next build
fi

cat <<MSG

  Knotwork demo is starting on http://localhost:${PORT}

  Demo sign-ins (demo only — invented people, not for real use):
    Teacher   teacher@knotwork.test   practise-slowly
    Students  tamsin@knotwork.test    practise-slowly
              jonah@knotwork.test     practise-slowly
              wren@knotwork.test      practise-slowly

MSG
exec npx next start -p "${PORT}"
