#!/usr/bin/env bash
# Cold `proofrun size` (the whole-procedure design table, n = 1..10), JVM start included: several runs, median.
#
#   src/bench/size-cold.sh RUNS JAR [JAR...] [-- SIZE-ARGS...]
#   e.g. src/bench/size-cold.sh 9 target/proofrun.jar
#        src/bench/size-cold.sh 9 /tmp/before.jar target/proofrun.jar        # two builds, runs interleaved
#        src/bench/size-cold.sh 5 target/proofrun.jar -- --target 1.33 --expected 1.67 --expected-cp 2.0
#
# Default arguments: --target 1.33 --expected 1.67 (the README's example). With several jars the runs alternate
# (A B A B ...), so every jar sees the same load. Each run is a fresh JVM (`java -jar JAR size ...`, output
# discarded). Reported per run: wall time from just before the process starts to its exit, and the processor time
# (user + system, all threads), which stretches less than the wall time on a loaded machine; then per jar the
# median and range, and the load average (1, 5, 15 min) at the end — the goal (1.5 s wall on two cores) is about
# an idle machine, so say which it was. Needs /usr/bin/time.
set -euo pipefail
runs="$1"; shift
jars=()
while [ $# -gt 0 ] && [ "$1" != "--" ]; do jars+=("$1"); shift; done
[ $# -gt 0 ] && shift
args=("$@")
[ ${#args[@]} -eq 0 ] && args=(--target 1.33 --expected 1.67)
median() { printf '%s\n' "$@" | sort -n | awk '{ v[NR] = $1 } END { print v[int((NR + 1) / 2)] " ms (min " v[1] ", max " v[NR] ")" }'; }
tmp="$(mktemp -d)"
trap 'rm -rf "$tmp"' EXIT
echo "load average at start $(cut -d' ' -f1-3 /proc/loadavg), $(nproc) cores"
for ((i = 1; i <= runs; i++)); do
  for j in "${!jars[@]}"; do
    start=$(date +%s%3N)
    /usr/bin/time -f "%U %S" -o "$tmp/cpu" java -jar "${jars[$j]}" size "${args[@]}" >/dev/null
    end=$(date +%s%3N)
    cpu=$(awk '{ printf "%d", ($1 + $2) * 1000 }' "$tmp/cpu")
    echo "$((end - start)) $cpu" >> "$tmp/jar$j"
    echo "run $i ${jars[$j]}: $((end - start)) ms wall, $cpu ms CPU"
  done
done
for j in "${!jars[@]}"; do
  echo "${jars[$j]}: median of $runs: wall $(median $(cut -d' ' -f1 "$tmp/jar$j")), CPU $(median $(cut -d' ' -f2 "$tmp/jar$j"))"
done
echo "load average at end $(cut -d' ' -f1-3 /proc/loadavg), $(nproc) cores"
