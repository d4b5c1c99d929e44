#!/usr/bin/env bash
# Runs the data-layer and API tests against a real PostgreSQL server (the DATABASE_URL path),
# started here on 127.0.0.1 and stopped afterwards.
set -euo pipefail
cd "$(dirname "$0")/.."
eval "$(scripts/pg-test-server.sh start)"
trap 'scripts/pg-test-server.sh stop' EXIT
echo "Running the API and data-layer tests on PostgreSQL at $TEST_DATABASE_URL"
TEST_DATABASE_URL="$TEST_DATABASE_URL" npx vitest run tests/api tests/sharing tests/uploads tests/hardening --passWithNoTests
