#!/usr/bin/env bash
# Member page against the stylesheet in one run (a benchmark, never part of the tests): starts the shipped jar
# on the demo over a throw-away data directory, logs in once, and drives both addresses with wrk at the same
# connections one after the other, printing each one's requests/s, its latency spread and the ratio, and the server's
# CPU time per request of each.
# WRK_CONNECTIONS (default 32), WRK_SECONDS (default 20), WRK_THREADS (default 2), PORT (default 7092).
set -euo pipefail
cd "$(dirname "$0")/../../.."
command -v wrk >/dev/null || { echo "wrk is not installed (Debian: apt-get install wrk)"; exit 1; }
port=${PORT:-7092}
conns=${WRK_CONNECTIONS:-32}
secs=${WRK_SECONDS:-20}
threads=${WRK_THREADS:-2}
# shellcheck source=demo-server.sh
. src/jmh/scripts/demo-server.sh
demo_server "$port" target/office-load/ratio-server.log
session=$(java -cp target/office-load com.baysheet.bench.OfficeLoad --base "http://127.0.0.1:$port" --setup-code "$code" --print-session yes)
page=$(echo "$session" | sed -n 's/^page=//p')
cookie=$(echo "$session" | sed -n 's/^cookie=//p')
base="http://127.0.0.1:$port"
echo "machine: $(nproc) cores; load average before: $(cut -d' ' -f1-3 /proc/loadavg); page $page"
# warm both (the page's cache entry, the JIT) before either is measured
wrk -t "$threads" -c "$conns" -d 5s -H "Cookie: $cookie" "$base$page" >/dev/null
wrk -t "$threads" -c "$conns" -d 5s "$base/static/baysheet.css" >/dev/null
# the server's CPU time (user + system, clock ticks) now: each run's share of it, per request, is a figure that
# what else the machine runs disturbs less than the requests per second
ticks() { read -r -a st < "/proc/$pid/stat"; echo $(( st[13] + st[14] )); }
t0=$(ticks)
css=$(wrk -t "$threads" -c "$conns" -d "${secs}s" --latency "$base/static/baysheet.css")
t1=$(ticks)
member=$(wrk -t "$threads" -c "$conns" -d "${secs}s" --latency -H "Cookie: $cookie" "$base$page")
t2=$(ticks)
echo "== stylesheet"; echo "$css" | grep -E "Requests/sec|Non-2xx|50%|90%|99%|Transfer/sec|requests in"
echo "== member page"; echo "$member" | grep -E "Requests/sec|Non-2xx|50%|90%|99%|Transfer/sec|requests in"
curl -s -o /dev/null -w "member page as fetched once: HTTP %{http_code}, %{size_download} bytes\n" -H "Cookie: $cookie" "$base$page"
a=$(echo "$css" | awk '/Requests\/sec/ {print $2}'); b=$(echo "$member" | awk '/Requests\/sec/ {print $2}')
echo "ratio member page / stylesheet: $(awk -v a="$a" -v b="$b" 'BEGIN {printf "%.2f", b / a}')"
na=$(echo "$css" | awk '/requests in/ {print $1}'); nb=$(echo "$member" | awk '/requests in/ {print $1}')
hz=$(getconf CLK_TCK)
echo "server CPU per request: stylesheet $(awk -v t=$((t1 - t0)) -v n="$na" -v hz="$hz" 'BEGIN {printf "%.1f", t / hz / n * 1e6}') µs, member page $(awk -v t=$((t2 - t1)) -v n="$nb" -v hz="$hz" 'BEGIN {printf "%.1f", t / hz / n * 1e6}') µs; their ratio (stylesheet / page) $(awk -v a=$((t1 - t0)) -v b=$((t2 - t1)) -v na="$na" -v nb="$nb" 'BEGIN {printf "%.2f", (a / na) / (b / nb)}')"
echo "load average after: $(cut -d' ' -f1-3 /proc/loadavg)"
