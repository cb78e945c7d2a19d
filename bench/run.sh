#!/usr/bin/env bash
# Side-by-side speed benchmark: the parse floor, `cellcheck check`, and the R and pandas/scipy reference scripts,
# one after another on the same generated files, each timed as a whole process (wall seconds, peak RSS).
#
# Usage (from the repository root):  bench/run.sh [ROWS[:CELLS]...]
#   default: 1000000:10000 10000000:10000 1000000:1000
#   CELLS=1000       cell count for a ROWS argument given without one (default 10000; 1000 or 10000)
#   BENCH_DIR=DIR    scratch folder for data and reports (default /tmp/cellcheck-bench; existing data are reused)
#   RESULTS=FILE     where the Markdown table is also written (default bench/results/latest.md)
#   TIMEOUT=SECONDS  limit for each timed tool (default 3600); a tool that runs over is reported as "timeout"
#   REPEAT=N         rounds per file (default 1); each round runs every tool once, in turn, and the table gives the
#                    median seconds and the largest peak memory over the rounds (a shared machine is noisy)
#   PUBLISH=0        time the plain Release build instead of the published tool (self-contained, ReadyToRun)
set -euo pipefail

[[ -f CellCheck.sln && -d bench/reference ]] || { echo "run bench/run.sh from the repository root" >&2; exit 2; }
[[ -x /usr/bin/time ]] || { echo "/usr/bin/time is needed (Debian package: time)" >&2; exit 2; }

DEFAULT_CELLS=${CELLS:-10000}
BENCH_DIR=${BENCH_DIR:-/tmp/cellcheck-bench}
RESULTS=${RESULTS:-bench/results/latest.md}
TIMEOUT=${TIMEOUT:-3600}
REPEAT=${REPEAT:-1}
[[ $REPEAT =~ ^[1-9][0-9]*$ ]] || { echo "REPEAT must be a positive whole number" >&2; exit 2; }
RUNS=("$@")
(( ${#RUNS[@]} )) || RUNS=(1000000:10000 10000000:10000 1000000:1000)
[[ $RESULTS == *.md ]] || { echo "RESULTS must name a .md file (the benchmark never writes over its inputs)" >&2; exit 2; }

BENCH=bench/CellCheck.Benchmarks/bin/Release/net10.0/CellCheck.Benchmarks
PUBLISH=${PUBLISH:-1}
case $(uname -m) in aarch64) RID=linux-arm64 ;; *) RID=linux-x64 ;; esac
CELLCHECK=src/CellCheck.Cli/bin/Release/net10.0/cellcheck
[[ $PUBLISH == 1 ]] && CELLCHECK=$BENCH_DIR/cellcheck-$RID/cellcheck
PYTHON=/usr/bin/python3   # the Debian python, which has the Debian scipy and pandas

LOAD=$(cut -d' ' -f1-3 /proc/loadavg)   # before anything runs: other work on the machine skews the timings
echo "building Release ..."
dotnet build bench/CellCheck.Benchmarks -c Release -nologo -v q >/dev/null
dotnet build src/CellCheck.Cli -c Release -nologo -v q >/dev/null
if [[ $PUBLISH == 1 ]]; then
  echo "publishing the tool for $RID (self-contained, ReadyToRun; a minute or two) ..."
  dotnet publish src/CellCheck.Cli -c Release -r "$RID" -nologo -v q -o "$BENCH_DIR/cellcheck-$RID" >/dev/null
fi

# Which reference tools are here; a missing one is skipped with a note, not an error.
HAVE_R=no HAVE_PY=no
if command -v Rscript >/dev/null && Rscript -e 'quit(status = !requireNamespace("data.table", quietly = TRUE))' 2>/dev/null; then
  HAVE_R=yes
else
  echo "note: Rscript with data.table not found; the R column is skipped (apt-get install r-base-core r-cran-data.table)"
fi
if [[ -x $PYTHON ]] && $PYTHON -c 'import scipy, pandas' 2>/dev/null; then
  HAVE_PY=yes
else
  echo "note: $PYTHON cannot import scipy and pandas; the pandas/scipy column is skipped (apt-get install python3-scipy python3-pandas)"
fi

# The machine, for the record.
machine() {
  echo "- CPU: $(nproc) cores, $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2- | sed 's/^ *//')"
  echo "- RAM: $(awk '/MemTotal/ {printf "%.1f GB", $2 / 1048576}' /proc/meminfo)"
  echo "- load average before the run: $LOAD"
  echo "- .NET SDK: $(dotnet --version); CellCheck timed as $([[ $PUBLISH == 1 ]] && echo "published for $RID (self-contained, composite ReadyToRun)" || echo "the plain Release build")"
  [[ $HAVE_R == yes ]] && echo "- $(Rscript -e 'cat(R.version.string, "; data.table", format(packageVersion("data.table")))')"
  [[ $HAVE_PY == yes ]] && echo "- $($PYTHON -c 'import sys, scipy, pandas, numpy; print(f"Python {sys.version.split()[0]}; scipy {scipy.__version__}; pandas {pandas.__version__}; numpy {numpy.__version__}")')"
  return 0
}

# measure NAME OKCODES COMMAND...: runs COMMAND (at most $TIMEOUT seconds) with its output in $OUT/NAME.log; sets
# SECONDS_ and MB_ from /usr/bin/time, or "timeout" / "failed" when its exit code is not in OKCODES (e.g. "0 1").
measure() {
  local name=$1 ok=$2 code=0
  shift 2
  /usr/bin/time -f "%e %M" -o "$OUT/$name.time" timeout "$TIMEOUT" "$@" >"$OUT/$name.log" 2>&1 || code=$?
  if [[ " $ok " == *" $code "* ]]; then
    read -r SECONDS_ KB < <(tail -n 1 "$OUT/$name.time")   # after "Command exited with non-zero status 1"
    MB_=$(awk -v kb="$KB" 'BEGIN { printf "%.0f", kb / 1024 }')
  elif ((code == 124)); then
    echo "  $name ran over $TIMEOUT s and was stopped" >&2
    SECONDS_=timeout MB_=-
  else
    echo "  $name failed with exit code $code; see $OUT/$name.log" >&2
    SECONDS_=failed MB_=-
  fi
}

ratio() { awk -v a="$1" -v b="$2" 'BEGIN { if (a + 0 > 0 && b + 0 > 0) printf "%.1f", a / b; else printf "-" }'; }

# median VALUES...: the median of numbers (a word such as "failed" wins if any round gave one); largest VALUES...: the largest.
median() {
  local v
  for v in "$@"; do [[ $v =~ ^[0-9.]+$ ]] || { echo "$v"; return; }; done
  printf '%s\n' "$@" | sort -g | awk '{ a[NR] = $1 } END { if (NR % 2) print a[(NR + 1) / 2]; else printf "%.3f\n", (a[NR / 2] + a[NR / 2 + 1]) / 2 }'
}
largest() { printf '%s\n' "$@" | awk '$1 ~ /^[0-9]+$/ { if ($1 > m) m = $1; seen = 1 } END { if (seen) print m; else print "-" }'; }

mkdir -p "$BENCH_DIR/out"
OUT=$BENCH_DIR/out
ROWS_OUT=()
for run in "${RUNS[@]}"; do
  rows=${run%%:*}
  cells=$DEFAULT_CELLS
  [[ $run == *:* ]] && cells=${run#*:}
  # ROWS a multiple of 1000, so the generator's file name (screen-1m-10k, screen-20k-1k) tells the row count.
  [[ $rows =~ ^[1-9][0-9]*000$ && ($cells == 1000 || $cells == 10000) ]] ||
    { echo "bad run '$run': ROWS[:CELLS], ROWS a multiple of 1000, CELLS 1000 or 10000" >&2; exit 2; }

  # The generator names the files; generate into a fresh folder and move them in, so an interrupted
  # generation never leaves a half-written file to be reused, and existing data are never rewritten.
  label=$( ((rows % 1000000 == 0)) && echo "$((rows / 1000000))m" || echo "$((rows / 1000))k")
  name=screen-$label-$((cells / 1000))k
  csv=$BENCH_DIR/$name.csv
  if [[ ! -f $csv || ! -f $BENCH_DIR/$name.yaml ]]; then
    echo "generating $name ..."
    fresh=$(mktemp -d "$BENCH_DIR/.generate.XXXXXX")
    "$BENCH" generate "$rows" "$cells" "$fresh" >/dev/null
    mv -n "$fresh/$name.csv" "$fresh/$name.yaml" "$BENCH_DIR/"
    rm -rf "$fresh"
  fi

  echo "timing $name ($rows rows, $cells cells) ..."
  cat "$csv" >/dev/null   # read it once, so every tool starts from the page cache

  floors=() ccs=() ccm=() rs=() rm=() pys=() pym=()
  for ((round = 1; round <= REPEAT; round++)); do
    # The parse floor reports its own Sep-pass time, process start excluded; check it saw every row.
    measure "$name.floor.$round" 0 "$BENCH" floor "$csv"
    f=$(awk '{ print $1 }' "$OUT/$name.floor.$round.log")
    grep -q " $rows rows," "$OUT/$name.floor.$round.log" || { echo "  floor did not count $rows rows" >&2; f=failed; }
    floors+=("$f")

    measure "$name.cellcheck.$round" "0 1" "$CELLCHECK" check "$BENCH_DIR/$name.yaml" --json "$OUT/$name.report.json" --quiet
    ccs+=("$SECONDS_") ccm+=("$MB_")

    if [[ $HAVE_R == yes ]]; then
      measure "$name.R.$round" 0 Rscript bench/reference/check.R "$csv"
      rs+=("$SECONDS_") rm+=("$MB_")
    fi
    if [[ $HAVE_PY == yes ]]; then
      measure "$name.scipy.$round" 0 "$PYTHON" bench/reference/check.py "$csv"
      pys+=("$SECONDS_") pym+=("$MB_")
    fi
  done

  floor=$(median "${floors[@]}")
  cc_s=$(median "${ccs[@]}") cc_mb=$(largest "${ccm[@]}")
  r_s=skipped r_mb=-
  [[ $HAVE_R == yes ]] && { r_s=$(median "${rs[@]}"); r_mb=$(largest "${rm[@]}"); }
  py_s=skipped py_mb=-
  [[ $HAVE_PY == yes ]] && { py_s=$(median "${pys[@]}"); py_mb=$(largest "${pym[@]}"); }

  ROWS_OUT+=("| $name.csv | $rows | $cells | $floor | $cc_s | $cc_mb | $r_s | $r_mb | $py_s | $py_mb | $(ratio "$r_s" "$cc_s") | $(ratio "$py_s" "$cc_s") | $(ratio "$cc_s" "$floor") |")
done

# The report: machine, then the ratio table; printed, and written to $RESULTS through a temporary file.
report() {
  echo "## CellCheck side-by-side benchmark ($(date -u +%Y-%m-%d))"
  echo
  machine
  echo
  echo "| file | rows | cells | floor s | CellCheck s | CellCheck peak MB | R s | R peak MB | pandas/scipy s | pandas/scipy peak MB | R / CellCheck | scipy / CellCheck | CellCheck / floor |"
  echo "| --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: |"
  printf '%s\n' "${ROWS_OUT[@]}"
  echo
  echo "Seconds are wall time of the whole process (start-up included), except the floor: the Sep pass alone;"
  echo "medians over $REPEAT round(s), peak memory the largest over the rounds."
  echo "The reference scripts ignore the day block and run fewer checks than CellCheck (doing less work; see bench/README.md)."
}
mkdir -p "$(dirname "$RESULTS")"
tmp=$(mktemp "$(dirname "$RESULTS")/.latest.XXXXXX")
report | tee "$tmp"
mv "$tmp" "$RESULTS"
echo
echo "written: $RESULTS (tool output and reports in $OUT)"
