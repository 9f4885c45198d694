#!/usr/bin/env bash
# Start-up, memory, bytes per key step, idle bytes and idle CPU of the NativeAOT workbench at 120x40 on a demo
# plant, in a pseudo-terminal and in tmux (see measure.py for how each figure is taken).
#   tests/perf/measure.sh                 publish the AOT binary, then measure
#   TERMLOCUS_AOT_BIN=path tests/perf/measure.sh [measure.py options]   measure an existing binary
# Needs python3, tmux and /usr/bin/time (Debian package `time`). Extra arguments go to measure.py
# (--runs, --steps, --idle, --plant, --json FILE, --strict, --nice N). The idle-CPU floor comes from
# tests/perf/PollFloor, published here too: the idle workbench's waits and nothing else.
set -euo pipefail
root=$(cd "$(dirname "$0")/../.." && pwd)
for tool in python3 tmux /usr/bin/time; do
  command -v "$tool" >/dev/null 2>&1 || { echo "measure: $tool is not installed" >&2; exit 2; }
done
out=""
floor=$(mktemp -d)
trap 'rm -rf "$floor" ${out:+"$out"}' EXIT
bin=${TERMLOCUS_AOT_BIN:-}
if [ -z "$bin" ]; then
  out=$(mktemp -d)
  echo "measure: publishing the NativeAOT binary (dotnet publish src/TermLocus -c Release)"
  dotnet publish "$root/src/TermLocus" -c Release -o "$out" -nologo -v q >"$out/publish.log" 2>&1 \
    || { cat "$out/publish.log" >&2; exit 2; }
  bin="$out/termlocus"
fi
echo "measure: publishing tests/perf/PollFloor (the idle-CPU floor)"
dotnet publish "$root/tests/perf/PollFloor" -c Release -o "$floor" -nologo -v q >"$floor/publish.log" 2>&1 \
  || { cat "$floor/publish.log" >&2; exit 2; }
echo "measure: $(nproc) cores, Linux $(uname -r), $(date -u +%Y-%m-%d)"
python3 "$root/tests/perf/measure.py" --bin "$bin" --floor-bin "$floor/PollFloor" --cwd "$root" "$@"
