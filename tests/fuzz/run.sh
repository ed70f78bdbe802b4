#!/usr/bin/env bash
# Builds the scene reader's libFuzzer target with clang, ASan and UBSan in its own build folder
# and runs it for a given time on one core.
#   tests/fuzz/run.sh [SECONDS] [BUILD_DIR]        default 600 s, build-fuzz/
# The seed corpus is scenes/ and tests/bad_scenes/; the dictionary is tests/fuzz/scene.dict.
# What the run finds (corpus, crash-*, timeout-*, oom-* files, fuzz-0.log) stays in BUILD_DIR,
# out of the repository: turn each crash into a bad scene in tests/bad_scenes/ or a test.
# Extra libFuzzer options may follow in FUZZ_OPTIONS, e.g. FUZZ_OPTIONS="-max_len=20000".
set -euo pipefail
cd "$(dirname "$0")/../.."
root=$(pwd)
seconds=${1:-600}
build=${2:-build-fuzz}
case "$build" in /*) ;; *) build="$root/$build" ;; esac

cxx=${CXX_FUZZ:-clang++-14}
cc=${CC_FUZZ:-clang-14}
cmake -S "$root" -B "$build" -DCMAKE_BUILD_TYPE=Debug -DCMAKE_CXX_COMPILER="$cxx" \
  -DCMAKE_C_COMPILER="$cc" -DSWARF_FUZZ=ON -DSWARF_BUILD_TESTS=OFF \
  -DSWARF_BUILD_BENCHMARKS=OFF >/dev/null
cmake --build "$build" --target scene_reader_fuzz -j"${FUZZ_BUILD_JOBS:-2}"

mkdir -p "$build/corpus" "$build/seeds" "$build/artifacts"
for d in scenes tests/bad_scenes tests/absurd_scenes; do
  if [ -d "$root/$d" ]; then cp "$root/$d"/*.toml "$build/seeds/"; fi
done

cd "$build"
# One job on one core; an input taking over 10 s is a hang, over 2 GB an out-of-memory.
status=0
# shellcheck disable=SC2086
./tests/fuzz/scene_reader_fuzz -jobs=1 -workers=1 -max_total_time="$seconds" -timeout=10 \
  -rss_limit_mb=2048 -dict="$root/tests/fuzz/scene.dict" -artifact_prefix="$build/artifacts/" \
  -print_final_stats=1 ${FUZZ_OPTIONS:-} corpus seeds || status=$?
echo "fuzz: log in $build/fuzz-0.log; corpus $(ls corpus | wc -l) files;" \
  "artefacts: $(ls artifacts | wc -l) in $build/artifacts"
grep -E '^#[0-9]+' fuzz-0.log | tail -n 1
grep -E '^stat::' fuzz-0.log || true
exit $status
