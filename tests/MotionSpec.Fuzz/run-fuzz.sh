#!/usr/bin/env bash
# Coverage-guided fuzzing of the whole spec pipeline with AFL++ and SharpFuzz.
#
#   tests/MotionSpec.Fuzz/run-fuzz.sh [seconds]      (default 120)
#
# Installs afl++ when it is missing (apt-get, as root), restores the sharpfuzz tool, publishes the harness in
# Release, instruments the MotionSpec assemblies and fuzzes from the seed corpus for the given time. Every
# crash or hang is copied to regressions/ under a name made from its content, and replayed in process to
# say what it is.
#
# Exit: 0 nothing found; 1 a crash or hang was found; 2 the build, instrumentation or fuzzer failed;
# 3 afl-fuzz is not available and could not be installed.
set -uo pipefail

seconds=${1:-120}
case "$seconds" in '' | *[!0-9]*) echo "usage: $0 [seconds]" >&2; exit 2 ;; esac

here=$(cd "$(dirname "$0")" && pwd)
root=$(cd "$here/../.." && pwd)
work=$here/out                      # build output, logs and findings; ignored by git
bin=$work/bin
findings=$work/findings
mkdir -p "$work"

fail() { echo "fuzz: $1"; [ -n "${2:-}" ] && [ -f "$2" ] && tail -n 15 "$2"; exit "${3:-2}"; }

if ! command -v afl-fuzz >/dev/null 2>&1; then
  if [ "$(id -u)" = 0 ] && command -v apt-get >/dev/null 2>&1; then
    echo "fuzz: installing afl++"
    { apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq afl++; } >"$work/apt.log" 2>&1
  fi
  command -v afl-fuzz >/dev/null 2>&1 || fail "afl-fuzz is not installed and could not be installed" "$work/apt.log" 3
fi

cd "$root" || exit 2
dotnet tool restore >"$work/tool.log" 2>&1 || fail "dotnet tool restore failed" "$work/tool.log"

# A fresh publish each time: sharpfuzz rewrites the assemblies in place and refuses ones it already did.
rm -rf "$bin"
dotnet publish "$here/MotionSpec.Fuzz.csproj" -c Release -o "$bin" --nologo >"$work/build.log" 2>&1 \
  || fail "build failed" "$work/build.log"
for dll in "$bin"/MotionSpec.*.dll; do
  [ "$(basename "$dll")" = MotionSpec.Fuzz.dll ] && continue
  dotnet tool run sharpfuzz "$dll" >>"$work/instrument.log" 2>&1 || fail "instrumenting $(basename "$dll") failed" "$work/instrument.log"
done

rm -rf "$findings"
# The harness is not a native instrumented binary (AFL_SKIP_BIN_CHECK); a fresh machine has no CPU governor
# or core-dump settings to speak of; the cores are shared, so no pinning and a lower priority.
AFL_SKIP_BIN_CHECK=1 AFL_SKIP_CPUFREQ=1 AFL_I_DONT_CARE_ABOUT_MISSING_CRASHES=1 AFL_NO_UI=1 AFL_NO_AFFINITY=1 \
AFL_FAST_CAL=1 \
  nice -n 10 afl-fuzz -i "$here/corpus" -o "$findings" -x "$here/motion.dict" -t 20000 -m none -V "$seconds" \
  -- dotnet "$bin/MotionSpec.Fuzz.dll" >"$work/afl.log" 2>&1
afl_status=$?

stats=$findings/default/fuzzer_stats
[ -f "$stats" ] || fail "afl-fuzz did not start (exit $afl_status)" "$work/afl.log"
field() { sed -n "s/^$1 *: *//p" "$stats"; }
execs=$(field execs_done); run_time=$(field run_time); paths=$(field corpus_count)

shopt -s nullglob
found=0
for pair in crash:crashes hang:hangs; do
  kind=${pair%%:*}
  for input in "$findings/default/${pair#*:}"/id:*; do
    found=$((found + 1))
    name=$kind-$(sha1sum "$input" | cut -c1-12).motion
    cp "$input" "$here/regressions/$name"
    echo "fuzz: new $kind saved as tests/MotionSpec.Fuzz/regressions/$name"
    if [ "$kind" = crash ]; then
      # The build beside the published one is not instrumented: instrumented code needs AFL's shared memory.
      timeout 60 dotnet "$here/bin/Release/net10.0/MotionSpec.Fuzz.dll" --replay "$here/regressions/$name" | grep FAILED | sed 's/^[^:]*: FAILED /  /'
    fi
  done
done

echo "fuzz: ${execs:-0} executions in ${run_time:-0} s, ${paths:-0} inputs in the queue, $found finding(s)"
[ "$afl_status" -eq 0 ] || [ "$found" -gt 0 ] || fail "afl-fuzz stopped with exit $afl_status" "$work/afl.log"
[ "$found" -eq 0 ] || exit 1
