#!/usr/bin/env bash
# A profile-guided build of plumb (GCC): instrument, train on the benchmark's generated corpus
# and the practice calcs, rebuild with the profile. Both stages share one build directory,
# where GCC finds each object's profile by its path. Usage: profile-guided-build.sh [BUILD_DIR]
# (default build/pgo). Takes about twice a release build; the result's plumb_bench prints
# "profile-guided" in its build line.
set -euo pipefail
root=$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)
build=${1:-$root/build/pgo}
jobs=$(nproc)

cmake -S "$root" -B "$build" -DCMAKE_BUILD_TYPE=Release -DPLUMB_BUILD_TESTS=ON \
  -DPLUMB_BUILD_BENCHMARKS=ON -DPLUMB_PROFILE=generate
rm -rf "$build/profile"
cmake --build "$build" -j"$jobs" --target plumb_cli plumb_bench

training=$(mktemp -d)
trap 'rm -rf "$training"' EXIT
# The benchmark's own runs profile the line driver and the common rules; the practice calcs,
# with their planted slips, the rules and messages of the error paths.
"$build/tests/bench/plumb_bench" --equations 300000 --runs 1 --spawns 0 --keep "$training/gen"
"$build/cli/plumb" check --jobs 1 "$training/gen" > /dev/null || true
"$build/cli/plumb" check --jobs 1 "$root/corpus/practice" > /dev/null || true

cmake -S "$root" -B "$build" -DPLUMB_PROFILE=use
cmake --build "$build" -j"$jobs" --target plumb_cli plumb_bench
echo "profile-guided build in $build; run $build/tests/bench/plumb_bench for its figures"
