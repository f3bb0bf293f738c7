#!/usr/bin/env bash
# Office load (a benchmark, never part of the tests): builds the jar, starts the server on the demo
# project on loopback over a throw-away data directory, and drives it with OfficeLoad (32 users by default).
# Extra arguments go to OfficeLoad, e.g. --requests 20000 --rounds 3 --rate 500 --mix 80:10:8:2.
# SERVER_JAVA_OPTS sets the server JVM's options (default -Xmx1g); PORT its port (default 7091).
set -euo pipefail
cd "$(dirname "$0")/../../.."
port=${PORT:-7091}
# shellcheck source=demo-server.sh
. src/jmh/scripts/demo-server.sh
demo_server "$port" target/office-load/server.log
echo "machine: $(nproc) cores, $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | xargs), $(java -version 2>&1 | head -1)"
echo "server: pid $pid, ${SERVER_JAVA_OPTS:--Xmx1g}; load average before: $(cut -d' ' -f1-3 /proc/loadavg)"
java -cp target/office-load com.baysheet.bench.OfficeLoad --base "http://127.0.0.1:$port" --pid "$pid" --setup-code "$code" "$@"
