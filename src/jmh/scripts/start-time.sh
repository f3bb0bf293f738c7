#!/usr/bin/env bash
# Start time (a benchmark, never part of the tests): the shipped jar from launch until its first page is rendered
# (the login page, or the set-up page it sends to before set-up), over an existing database, with and without the
# class archive, in turn; prints the wall time and the process's CPU time (user + system) at that moment.
# Arguments: rounds (default 5). JAR sets the jar (default target/baysheet.jar).
set -euo pipefail
cd "$(dirname "$0")/../../.."
rounds=${1:-5}
jar=${JAR:-target/baysheet.jar}
port=${PORT:-7197}
[ -f "$jar" ] || mvn -B -ntp -q package -DskipTests
scratch=$(mktemp -d)
pid=
trap '[ -n "$pid" ] && kill "$pid" 2>/dev/null; rm -rf "$scratch"' EXIT
data=$scratch/data
# one start on the demo makes the database; the archive is made by the warm-up command (docs/deploy.md)
java -jar "$jar" --demo --bind 127.0.0.1 --port "$port" --data "$data" > "$scratch/first.log" 2>&1 & pid=$!
until curl -sf -o /dev/null "http://127.0.0.1:$port/health"; do sleep 0.2; done
kill "$pid"; wait "$pid" 2>/dev/null || true; pid=
java -XX:ArchiveClassesAtExit="$scratch/start.jsa" -Xlog:cds=error -jar "$jar" warm-up > /dev/null 2>&1
once() {
  local t0 t1 st
  t0=$(date +%s.%N)
  java "$@" -jar "$jar" --bind 127.0.0.1 --port "$port" --data "$data" > "$scratch/start.log" 2>&1 & pid=$!
  # the first page rendered: before set-up the login page sends to the set-up page, which is followed
  until curl -sfL -o /dev/null "http://127.0.0.1:$port/login"; do sleep 0.02; done
  t1=$(date +%s.%N)
  read -r -a st < "/proc/$pid/stat"
  printf '%.2f s (CPU %.2f s)' "$(echo "$t1 - $t0" | bc)" "$(echo "(${st[13]} + ${st[14]}) / $(getconf CLK_TCK)" | bc -l)"
  kill "$pid"; wait "$pid" 2>/dev/null || true; pid=
}
echo "machine: $(nproc) cores, $(java -version 2>&1 | head -1); load average before: $(cut -d' ' -f1-3 /proc/loadavg)"
for _ in $(seq 1 "$rounds"); do
  echo "without the archive $(once) | with it $(once -XX:SharedArchiveFile="$scratch/start.jsa") | load $(cut -d' ' -f1 /proc/loadavg)"
done
