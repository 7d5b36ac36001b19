#!/usr/bin/env bash
# HTTP benchmark of the packaged service on this machine (not a test: it prints figures).
# Measures start-up time to ready, then requests per second and p50/p99 latency of
# POST /api/v1/diagnoses beside GET /q/health/ready, with wrk on the same 2-core machine
# (client and server share the cores, so the figures are a floor for a dedicated server).
# Usage: src/bench/http-benchmark.sh [seconds per run, default 20]
set -euo pipefail
cd "$(dirname "$0")/../.."
SECONDS_PER_RUN=${1:-20}
PORT=${BENCH_PORT:-18080}
command -v wrk >/dev/null || { echo "wrk is needed: apt-get install -y wrk"; exit 1; }
[ -f target/quarkus-app/quarkus-run.jar ] || ./mvnw -B -q package -DskipTests

start=$(date +%s%N)
java -Xmx512m -Dquarkus.http.port=$PORT -jar target/quarkus-app/quarkus-run.jar > target/bench-server.log 2>&1 &
pid=$!
trap 'kill $pid 2>/dev/null || true' EXIT
until curl -sf "http://127.0.0.1:$PORT/q/health/ready" >/dev/null; do
  kill -0 $pid 2>/dev/null || { echo "server died"; cat target/bench-server.log; exit 1; }
  sleep 0.1
done
ready=$(( ($(date +%s%N) - start) / 1000000 ))
echo "startup_to_ready_ms=$ready"

# Warm-up so the JIT has compiled the hot path before measuring.
wrk -t2 -c8 -d10s -s src/bench/diagnosis-post.lua "http://127.0.0.1:$PORT/api/v1/diagnoses" >/dev/null
# Server CPU time (user + system, from /proc) per request: steadier than req/s on a shared machine,
# where other tenants' load moves throughput but not much the work each request costs.
cpu_ticks() { awk '{print $14 + $15}' /proc/$pid/stat; }
before=$(cpu_ticks)
out=$(wrk -t2 -c16 -d${SECONDS_PER_RUN}s --latency -s src/bench/diagnosis-post.lua "http://127.0.0.1:$PORT/api/v1/diagnoses" | grep RESULT)
after=$(cpu_ticks)
requests=$(sed 's/.*requests=\([0-9]*\).*/\1/' <<<"$out")
echo "diagnosis:"; echo "$out"
awk -v t=$((after - before)) -v hz="$(getconf CLK_TCK)" -v n="$requests" \
  'BEGIN { printf "server_cpu_ms_per_request=%.3f\n", 1000 * t / hz / n }'
echo "health:";    wrk -t2 -c16 -d${SECONDS_PER_RUN}s --latency -s src/bench/health-get.lua "http://127.0.0.1:$PORT/q/health/ready" | grep RESULT
rss_kb=$(awk '/VmHWM/{print $2}' /proc/$pid/status)
echo "server_peak_rss_mb=$((rss_kb / 1024))"
