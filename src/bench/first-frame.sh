#!/usr/bin/env bash
# Time from starting the window's process to its first painted frame, several runs, median.
#
#   xvfb-run -a src/bench/first-frame.sh RUNS COMMAND [ARGS...]
#   e.g. xvfb-run -a src/bench/first-frame.sh 7 java -jar target/proofrun.jar
#        xvfb-run -a src/bench/first-frame.sh 7 target/jpackage/proofrun/bin/proofrun
#
# JavaFX's own performance log does the timing: with sun.perflog set it notes the scene's first repaint, and
# sun.perflog.fx.firstpaintexit ends the process right after the first frame has been painted. The options
# reach the JVM through JAVA_TOOL_OPTIONS, so a jpackage launcher gets them as well as `java -jar`. Each run
# starts on a fresh, empty wizard home (a first start: the demo plan is read in the background), so no run
# profits from the one before except through the operating system's file cache. Reported per run: the wall time from just before the
# process starts to its exit at the first frame, and the processor time (user + system, all threads) the
# process used until then, which stretches less than the wall time on a loaded machine. Needs /usr/bin/time.
set -euo pipefail
runs="$1"; shift
if [ -z "${DISPLAY:-}" ]; then
  echo "first-frame: no DISPLAY; run under xvfb-run -a" >&2
  exit 2
fi
times=()
cpus=()
for ((i = 1; i <= runs; i++)); do
  home="$(mktemp -d)"
  start=$(date +%s%3N)
  (JAVA_TOOL_OPTIONS="-Dproofrun.home=$home -Dsun.perflog -Dsun.perflog.fx.firstpaintexit=true" \
    timeout 120 /usr/bin/time -f "%U %S" -o "$home/cpu" "$@" >/dev/null 2>&1) || true
  end=$(date +%s%3N)
  cpu=$(awk '{ printf "%d", ($1 + $2) * 1000 }' "$home/cpu" 2>/dev/null || echo 0)
  rm -rf "$home"
  times+=($((end - start)))
  cpus+=("$cpu")
  echo "run $i: $((end - start)) ms wall, $cpu ms CPU"
done
median() { printf '%s\n' "$@" | sort -n | awk '{ v[NR] = $1 } END { print v[int((NR + 1) / 2)] " ms (min " v[1] ", max " v[NR] ")" }'; }
echo "median of $runs: wall $(median "${times[@]}"), CPU $(median "${cpus[@]}"); load average $(cut -d' ' -f1-3 /proc/loadavg), $(nproc) cores"
