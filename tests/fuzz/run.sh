#!/usr/bin/env bash
# Builds one of the readers' libFuzzer targets with clang, ASan and UBSan in its own build folder
# and runs it for a given time on one core.
#   tests/fuzz/run.sh [SECONDS] [BUILD_DIR] [TARGET]   default 600 s, build-fuzz/, scene
# TARGET "scene": the scene reader; seeds scenes/ (lessons too), tests/bad_scenes/ and
#   tests/absurd_scenes/; dictionary tests/fuzz/scene.dict.
# TARGET "measured": the measurement file reader against scenes/plan-1-20-chuck-out.toml; seeds
#   scenes/measured/ and tests/bad_measurements/; dictionary tests/fuzz/measured.dict.
# Each target keeps its corpus in BUILD_DIR/TARGET/.
# What the run finds (corpus, crash-*, timeout-*, oom-* files, fuzz-0.log) stays in BUILD_DIR,
# out of the repository: turn each crash into a bad scene in tests/bad_scenes/ or a test.
# Extra libFuzzer options may follow in FUZZ_OPTIONS, e.g. FUZZ_OPTIONS="-max_len=20000". The
# build is optimised (RelWithDebInfo; FUZZ_BUILD_TYPE=Debug for a debugger): a valid scene that
# plans many passes takes over the 10 s limit unoptimised under ASan, though well under 1 s in a
# Release build.
set -euo pipefail
cd "$(dirname "$0")/../.."
root=$(pwd)
seconds=${1:-600}
build=${2:-build-fuzz}
target=${3:-scene}
case "$target" in
  scene) exe=scene_reader_fuzz dict=scene.dict seeds="scenes scenes/lessons tests/bad_scenes tests/absurd_scenes" ;;
  measured) exe=measured_reader_fuzz dict=measured.dict seeds="scenes/measured tests/bad_measurements" ;;
  *) echo "run.sh: TARGET must be scene or measured, not $target" >&2; exit 2 ;;
esac
case "$build" in /*) ;; *) build="$root/$build" ;; esac

cxx=${CXX_FUZZ:-clang++-14}
cc=${CC_FUZZ:-clang-14}
cmake -S "$root" -B "$build" -DCMAKE_BUILD_TYPE="${FUZZ_BUILD_TYPE:-RelWithDebInfo}" -DCMAKE_CXX_COMPILER="$cxx" \
  -DCMAKE_C_COMPILER="$cc" -DSWARF_FUZZ=ON -DSWARF_BUILD_TESTS=OFF \
  -DSWARF_BUILD_BENCHMARKS=OFF >/dev/null
cmake --build "$build" --target "$exe" -j"${FUZZ_BUILD_JOBS:-2}"

work="$build/$target"
mkdir -p "$work/corpus" "$work/seeds" "$work/artifacts"
for d in $seeds; do
  if [ -d "$root/$d" ]; then cp "$root/$d"/*.toml "$work/seeds/"; fi
done

cd "$work"
# One job on one core; an input taking over 10 s is a hang, over 2 GB an out-of-memory.
status=0
# shellcheck disable=SC2086
"$build/tests/fuzz/$exe" -jobs=1 -workers=1 -max_total_time="$seconds" -timeout=10 \
  -rss_limit_mb=2048 -dict="$root/tests/fuzz/$dict" -artifact_prefix="$work/artifacts/" \
  -print_final_stats=1 ${FUZZ_OPTIONS:-} corpus seeds || status=$?
echo "fuzz ($target): log in $work/fuzz-0.log; corpus $(ls corpus | wc -l) files;" \
  "artefacts: $(ls artifacts | wc -l) in $work/artifacts"
grep -E '^#[0-9]+' fuzz-0.log | tail -n 1
grep -E '^stat::' fuzz-0.log || true
exit $status
