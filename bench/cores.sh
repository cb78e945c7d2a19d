#!/usr/bin/env bash
# Processor use of one check over time: how many cores it keeps busy in each tenth of a second, to find the stretches
# where one core waits (a step that runs on one thread while nothing else is left to run beside it).
#
# Usage (from the repository root):  bench/cores.sh CELLCHECK DESIGN
#   CELLCHECK  the tool to time, e.g. /tmp/cellcheck-bench/cellcheck-linux-x64/cellcheck (bench/run.sh publishes it there)
#   DESIGN     the design file to check; the JSON report goes to a scratch file
# Prints "seconds cores" per sample, then the wall time. Linux and bash 5 only (/proc/PID/stat, EPOCHREALTIME). The
# sampling uses shell builtins alone, so that it takes almost no processor time from the check it watches.
set -euo pipefail
[[ $# -eq 2 ]] || { echo "usage: bench/cores.sh CELLCHECK DESIGN" >&2; exit 2; }
[[ -r /proc/self/stat && -n ${EPOCHREALTIME:-} ]] || { echo "needs Linux /proc and bash 5" >&2; exit 2; }
REPORT=$(mktemp --suffix=.json)
trap 'rm -f "$REPORT"' EXIT
TICK=$(getconf CLK_TCK)
now() { local t=${EPOCHREALTIME/[.,]/}; NOW=$((10#$t)); } # microseconds, into NOW (no subshell)
"$1" check "$2" --json "$REPORT" --quiet >/dev/null 2>&1 &
PID=$!
exec {PAUSE}<> <(:) # a pipe nothing is written to: reading it with a timeout waits without starting a process
now
START=$NOW PREV_T=$NOW PREV_CPU=0
while read -r STAT 2>/dev/null <"/proc/$PID/stat"; do
  read -ra FIELDS <<<"${STAT##*) }" # the fields after the command name: state, ppid, ... utime is the 12th, stime the 13th
  [[ ${FIELDS[0]} != Z ]] || break
  CPU=$((FIELDS[11] + FIELDS[12]))
  now
  if ((NOW > PREV_T)); then
    TENTHS=$(((CPU - PREV_CPU) * 10000000 / TICK / (NOW - PREV_T))) # cores × 10
    printf '%d.%d %d.%d\n' $(((NOW - START) / 1000000)) $(((NOW - START) / 100000 % 10)) $((TENTHS / 10)) $((TENTHS % 10))
  fi
  PREV_T=$NOW PREV_CPU=$CPU
  read -rt 0.1 -u "$PAUSE" _ || true
done
wait "$PID" || true
now
printf 'wall %d.%02d s\n' $(((NOW - START) / 1000000)) $(((NOW - START) / 10000 % 100))
