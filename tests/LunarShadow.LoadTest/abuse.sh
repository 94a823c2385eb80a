#!/usr/bin/env bash
# The abuse figure, end to end: starts the built Release service (default limits, the Containerfile's GC settings) on a
# loopback port, runs the load test's quiet and abuse modes, and prints for each the cached client's p50/p95/p99, req/s
# and errors, the abusive client's answers, the load average at start and end, and the service's peak RSS.
# Build first: dotnet build -c Release src/LunarShadow.Api && dotnet build -c Release tests/LunarShadow.LoadTest
# Usage: bash tests/LunarShadow.LoadTest/abuse.sh [seconds per run, default 30] [port, default 5187]
set -euo pipefail
cd "$(dirname "$0")/../.."
seconds="${1:-30}"
port="${2:-5187}"
url="http://127.0.0.1:$port"
echo "cores $(nproc); load average at start $(cut -d' ' -f1-3 /proc/loadavg)"
DOTNET_gcServer=0 DOTNET_GCConserveMemory=5 DOTNET_GCHeapHardLimitPercent=0x32 OutputCacheMegabytes=128 \
  Serilog__MinimumLevel__Default=Warning ASPNETCORE_URLS="$url" \
  dotnet src/LunarShadow.Api/bin/Release/net10.0/LunarShadow.Api.dll > /tmp/lunarshadow-abuse-service.log 2>&1 &
service=$!
trap 'kill "$service" 2>/dev/null || true' EXIT
for _ in $(seq 120); do curl -fs "$url/health/live" > /dev/null 2>&1 && break; sleep 0.5; done
peak=0
( while kill -0 "$service" 2>/dev/null; do
    rss=$(awk '/VmRSS/ {print $2}' "/proc/$service/status" 2>/dev/null || echo 0)
    [ "${rss:-0}" -gt "$peak" ] && peak=$rss && echo "$peak" > /tmp/lunarshadow-abuse-peak
    sleep 1
  done ) &
for mode in quiet abuse quiet; do
  echo "== $mode"
  dotnet tests/LunarShadow.LoadTest/bin/Release/net10.0/LunarShadow.LoadTest.dll "$url" "$seconds" 4 "$mode"
done
echo "service peak RSS $(( $(cat /tmp/lunarshadow-abuse-peak 2>/dev/null || echo 0) / 1024 )) MiB; load average at end $(cut -d' ' -f1-3 /proc/loadavg)"
