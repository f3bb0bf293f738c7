#!/usr/bin/env bash
# One-bay edit and its member page (a benchmark, never part of the tests): builds the jar, starts the server on
# loopback over a throw-away data directory (removed on exit), enters the varied 24-level plan through the JSON API
# and times edit + page with EditPage. Extra arguments go to EditPage, e.g. --warmup 2 --edits 20 --levels 24.
# SERVER_JAVA_OPTS sets the server JVM's options (default -Xmx1g); PORT its port (default 7093).
set -euo pipefail
cd "$(dirname "$0")/../../.."
port=${PORT:-7093}
# shellcheck source=demo-server.sh
. src/jmh/scripts/demo-server.sh
demo_server "$port" target/office-load/edit-page-server.log
javac -cp target/office-load -d target/office-load src/jmh/java/com/baysheet/bench/EditPage*.java
echo "machine: $(nproc) cores, $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | xargs), $(java -version 2>&1 | head -1)"
echo "server: pid $pid, ${SERVER_JAVA_OPTS:--Xmx1g}; load average at start: $(cut -d' ' -f1-3 /proc/loadavg)"
java -cp target/office-load com.baysheet.bench.EditPage --base "http://127.0.0.1:$port" --pid "$pid" --setup-code "$code" "$@"
