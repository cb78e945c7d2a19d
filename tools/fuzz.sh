#!/usr/bin/env bash
# Fuzzes CellCheck's readers for a bounded time. Not part of CI: CI runs only the regression tests kept from its
# findings (tests/CellCheck.IO.Tests/Fixtures/hostile/fuzz, listed in cases.tsv).
#
#   tools/fuzz.sh [SECONDS_PER_TARGET] [TARGET ...]        default: 60 s each for csv and design
#
# Targets: csv (data reader), design (design reader, then its options against fixed data), check (data reader, every
# check and every report writer), init (the design proposal), xlsx (workbook reader).
#
# Engines (FUZZ_ENGINE):
#   afl     AFL++ from Debian (apt-get install afl++) drives the harness through SharpFuzz: the assemblies are
#           instrumented with the sharpfuzz tool (dotnet tool SharpFuzz.CommandLine) for coverage feedback.
#           Installed here on first use unless FUZZ_NO_INSTALL=1. The default when both can be had.
#   inproc  the harness's own seeded mutational fuzzer in one process (no coverage; new outcomes grow the corpus).
#           Needs nothing but the SDK; the fallback.
# (libFuzzer: the harness also runs under SharpFuzz's libFuzzer mode, `CellCheck.Fuzz TARGET --libfuzzer`, but that
# needs the libfuzzer-dotnet driver, which no Debian package ships; it is not used here.)
#
# Output in artifacts/fuzz/: crashes/ (each distinct crashing input, .bin, with its exception in .txt) and, for afl,
# afl/TARGET/ (AFL++'s queue, crashes and fuzzer_stats). A crash found: fix it, then copy the input into
# tests/CellCheck.IO.Tests/Fixtures/hostile/fuzz/ and add its row to cases.tsv.
set -euo pipefail
cd "$(dirname "$0")/.."
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1

seconds=${1:-60}
shift || true
targets=("$@")
[ ${#targets[@]} -gt 0 ] || targets=(csv design)

out=artifacts/fuzz
bin=$out/bin
tools=$out/tools
mkdir -p "$out/crashes"

engine=${FUZZ_ENGINE:-}
if [ -z "$engine" ]; then
  engine=afl
  if [ "${FUZZ_NO_INSTALL:-0}" = 1 ] && { ! command -v afl-fuzz >/dev/null || [ ! -x "$tools/sharpfuzz" ]; }; then
    engine=inproc
  fi
fi

if [ "$engine" = afl ]; then
  if ! command -v afl-fuzz >/dev/null; then
    echo "installing afl++ (Debian package)"
    (apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq afl++) >/dev/null || engine=inproc
  fi
  if [ "$engine" = afl ] && [ ! -x "$tools/sharpfuzz" ]; then
    echo "installing the sharpfuzz instrumentation tool (SharpFuzz.CommandLine 2.3.0)"
    dotnet tool install --tool-path "$tools" SharpFuzz.CommandLine --version 2.3.0 >/dev/null || engine=inproc
  fi
  [ "$engine" = afl ] || echo "AFL++ or sharpfuzz could not be installed: using the in-process fuzzer"
fi

echo "building the harness (Release)"
rm -rf "$bin"
dotnet publish tools/CellCheck.Fuzz -c Release -o "$bin" -v quiet >/dev/null

if [ "$engine" = afl ]; then
  for dll in CellCheck.IO.dll CellCheck.Core.dll Sep.dll YamlDotNet.dll MiniExcel.dll; do
    "$tools/sharpfuzz" "$bin/$dll" >/dev/null
  done
  export AFL_SKIP_BIN_CHECK=1 AFL_SKIP_CPUFREQ=1 AFL_I_DONT_CARE_ABOUT_MISSING_CRASHES=1 AFL_NO_UI=1 AFL_NO_AFFINITY=1
fi

summary=()
total_execs=0
total_crashes=0
for t in "${targets[@]}"; do
  corpus=tools/CellCheck.Fuzz/corpus/$t
  echo "== $t: $engine for $seconds s, corpus $corpus"
  if [ "$engine" = afl ]; then
    rm -rf "$out/afl/$t"
    mkdir -p "$out/afl"
    afl-fuzz -i "$corpus" -o "$out/afl/$t" -t 10000 -m none -V "$seconds" -- dotnet "$bin/CellCheck.Fuzz.dll" "$t" --afl \
      > "$out/afl-$t.log" 2>&1 || { tail -20 "$out/afl-$t.log"; exit 1; }
    stats=$out/afl/$t/default/fuzzer_stats
    execs=$(awk -F: '/^execs_done/ {gsub(/ /, "", $2); print $2}' "$stats")
    crashes=$(awk -F: '/^saved_crashes/ {gsub(/ /, "", $2); print $2}' "$stats")
    paths=$(awk -F: '/^corpus_count/ {gsub(/ /, "", $2); print $2}' "$stats")
    for f in "$out/afl/$t"/default/crashes/id:*; do
      [ -e "$f" ] || continue
      cp "$f" "$out/crashes/$t-afl-$(sha256sum "$f" | cut -c1-12).bin"
    done
    line="$t: $execs executions, $crashes crashes saved, $paths inputs in AFL's queue"
  else
    log=$out/inproc-$t.log
    set +e
    dotnet "$bin/CellCheck.Fuzz.dll" "$t" --seconds "$seconds" --seed "${FUZZ_SEED:-1}" --corpus "$corpus" --crashes "$out/crashes" | tee "$log"
    set -e
    execs=$(grep -oE '^target [a-z]+: [0-9]+ executions' "$log" | grep -oE '[0-9]+' | head -1)
    crashes=$(grep -oE '[0-9]+ crashing inputs' "$log" | grep -oE '[0-9]+' | head -1)
    line="$t: $execs executions, $crashes crashing inputs"
  fi
  summary+=("$line")
  total_execs=$((total_execs + ${execs:-0}))
  total_crashes=$((total_crashes + ${crashes:-0}))
done

echo
echo "fuzzing summary ($engine, $seconds s per target)"
printf '  %s\n' "${summary[@]}"
echo "  total: $total_execs executions, $total_crashes crashes"
if [ "$total_crashes" -gt 0 ]; then
  echo "crashing inputs are in $out/crashes (replay: dotnet $bin/CellCheck.Fuzz.dll TARGET --replay FILE)"
  exit 1
fi
