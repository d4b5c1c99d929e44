#!/usr/bin/env bash
# Runs the data-layer and API tests against a real PostgreSQL server (the DATABASE_URL path),
# started here on 127.0.0.1 in a folder and on a port of its own, and stopped afterwards.
set -euo pipefail
cd "$(dirname "$0")/.."
export PG_TEST_DIR="$(mktemp -d /tmp/baywright-pg.XXXXXX)"
export PG_TEST_PORT="${PG_TEST_PORT:-$(python3 -c 'import socket; s=socket.socket(); s.bind(("127.0.0.1", 0)); print(s.getsockname()[1])')}"
[ "$(id -u)" = 0 ] && chown postgres:postgres "$PG_TEST_DIR" 2>/dev/null || true
start_output="$(scripts/pg-test-server.sh start)" || { echo "Could not start PostgreSQL; see $PG_TEST_DIR/server.log" >&2; exit 1; }
eval "$start_output"
trap 'scripts/pg-test-server.sh stop; rm -rf "$PG_TEST_DIR"' EXIT
echo "Running the API and data-layer tests on PostgreSQL at $TEST_DATABASE_URL (the fuzz at 100 runs a route here; npm test runs it at 1000)"
# `npm run test:pg -- tests/api/sign-in-throttle.test.ts` runs only the files named.
suites=(tests/api tests/sharing tests/uploads tests/planning-api tests/hardening)
[ "$#" -gt 0 ] && suites=("$@")
FUZZ_RUNS="${FUZZ_RUNS:-100}" TEST_DATABASE_URL="$TEST_DATABASE_URL" npx vitest run "${suites[@]}" --passWithNoTests
