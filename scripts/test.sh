#!/usr/bin/env bash
# npm test — install what the tests need when missing, then type-check, unit + integration, browser.
# Ends with one plain line: "N passed, N failed" (the type-check counts as one check).
set -uo pipefail
cd "$(dirname "$0")/.."
export NEXT_TELEMETRY_DISABLED=1

if [ ! -x node_modules/.bin/vitest ]; then
  echo "Installing dependencies…"
  if [ -f package-lock.json ]; then npm ci || exit 1; else npm install || exit 1; fi
fi

missing=()
command -v chromium >/dev/null 2>&1 || [ -x /usr/bin/chromium ] || missing+=(chromium)
command -v xmllint >/dev/null 2>&1 || missing+=(libxml2-utils)
command -v pdftoppm >/dev/null 2>&1 || missing+=(poppler-utils)
if [ "${#missing[@]}" -gt 0 ]; then
  echo "Installing Debian packages: ${missing[*]}"
  SUDO=""
  if [ "$(id -u)" -ne 0 ]; then SUDO="sudo"; fi
  $SUDO apt-get update -qq && DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq "${missing[@]}" || {
    echo "Could not install ${missing[*]}"; exit 1; }
fi

mkdir -p artifacts
node scripts/copy-samples.mjs
passed=0
failed=0
status=0

count() { # $1 = vitest JSON report; prints "passed failed"
  node -e '
    const fs = require("fs");
    try {
      const r = JSON.parse(fs.readFileSync(process.argv[1], "utf8"));
      const suitesFailed = (r.testResults || []).filter((f) => f.status === "failed" && (f.assertionResults || []).length === 0).length;
      console.log(`${r.numPassedTests} ${r.numFailedTests + suitesFailed}`);
    } catch { console.log("0 1"); }' "$1"
}

echo "── Type-check"
if npx tsc --noEmit -p .; then passed=$((passed + 1)); else failed=$((failed + 1)); status=1; fi

suite() { # $1 = heading, $2 = report name, $3 = vitest config (empty for the default one)
  echo "── $1"
  local report="artifacts/vitest-$2.json"
  rm -f "$report"
  npx vitest run ${3:+--config "$3"} --reporter=default --reporter=json --outputFile="$report" || status=1
  read -r p f < <(count "$report")
  passed=$((passed + p)); failed=$((failed + f))
}

suite "Unit and integration tests" unit ""
suite "Browser tests" browser vitest.browser.config.ts
suite "Hardening (production build: hostile uploads, access control, headers, crash, load smoke, sizes)" hardening vitest.hardening.config.ts

if [ "$failed" -gt 0 ]; then status=1; fi
echo "${passed} passed, ${failed} failed"
exit "$status"
