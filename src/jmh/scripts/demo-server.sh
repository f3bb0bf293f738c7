# Sourced by the load scripts (never run alone): builds the jar and the load generator, starts the shipped jar on
# the demo over a throw-away data directory on loopback, waits for its health check, and reads the one-time
# set-up code it prints. Sets pid, data and code; stops the server and removes the directory (and the signing key made
# beside the data directory) on exit.
# Arguments: the port and the server's log file. SERVER_JAVA_OPTS sets the server JVM's options (default -Xmx1g);
# JAR runs a jar already built (another commit's, for a before and after) instead of building target/baysheet.jar.
demo_server() {
  local port=$1 log=$2 jar=${JAR:-target/baysheet.jar}
  [ -n "${JAR:-}" ] || mvn -B -ntp -q package -DskipTests
  mkdir -p target/office-load
  javac -d target/office-load src/jmh/java/com/baysheet/bench/OfficeLoad*.java
  # the data directory inside a throw-away one: the signing key the server makes beside it goes with it
  scratch=$(mktemp -d)
  data=$scratch/data
  # shellcheck disable=SC2086
  java ${SERVER_JAVA_OPTS:--Xmx1g} -jar "$jar" --demo --bind 127.0.0.1 --port "$port" --data "$data" \
    > "$log" 2>&1 &
  pid=$!
  # under set -e a failing wait (the server's exit status after the kill) would end the trap before the rm
  trap 'kill "$pid" 2>/dev/null; wait "$pid" 2>/dev/null || true; rm -rf "$scratch"' EXIT
  for _ in $(seq 1 240); do
    curl -sf "http://127.0.0.1:$port/health" >/dev/null 2>&1 && break
    sleep 0.25
  done
  # the first administrator is made with the one-time set-up code the server prints at start
  code=$(grep -o 'set-up code: [A-Z0-9]*' "$log" | head -1 | cut -d' ' -f3)
}
