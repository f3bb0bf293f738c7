#!/usr/bin/env bash
# Office load (a benchmark, never part of the tests): builds the jar, starts the server on the demo
# project on loopback over a throw-away data directory, and drives it with OfficeLoad (32 users by default).
# Extra arguments go to OfficeLoad, e.g. --requests 20000 --rounds 3 --rate 500 --mix 80:10:8:2.
# SERVER_JAVA_OPTS sets the server JVM's options (default -Xmx1g); PORT its port (default 7091).
set -euo pipefail
cd "$(dirname "$0")/../../.."
mvn -B -ntp -q package -DskipTests
mkdir -p target/office-load
javac -d target/office-load src/jmh/java/com/baysheet/bench/OfficeLoad*.java
data=$(mktemp -d)
port=${PORT:-7091}
# shellcheck disable=SC2086
java ${SERVER_JAVA_OPTS:--Xmx1g} -jar target/baysheet.jar --demo --bind 127.0.0.1 --port "$port" --data "$data" \
  > target/office-load/server.log 2>&1 &
pid=$!
trap 'kill "$pid" 2>/dev/null; wait "$pid" 2>/dev/null; rm -rf "$data"' EXIT
for _ in $(seq 1 240); do
  curl -sf "http://127.0.0.1:$port/health" >/dev/null 2>&1 && break
  sleep 0.25
done
echo "machine: $(nproc) cores, $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | xargs), $(java -version 2>&1 | head -1)"
echo "server: pid $pid, ${SERVER_JAVA_OPTS:--Xmx1g}; load average before: $(cut -d' ' -f1-3 /proc/loadavg)"
# the first administrator is made with the one-time set-up code the server prints at start
code=$(grep -o 'set-up code: [A-Z0-9]*' target/office-load/server.log | head -1 | cut -d' ' -f3)
java -cp target/office-load com.baysheet.bench.OfficeLoad --base "http://127.0.0.1:$port" --pid "$pid" --setup-code "$code" "$@"
