#!/usr/bin/env bash
# Smoke test of the NativeAOT build: publish `termlocus` as one native executable (timed, no trim/AOT warning
# allowed), run two verbs on the demo plants, and drive the workbench in tmux at 120x40 (arrow keys, q) checking
# that the shell is back afterwards. Prints one PASS/FAIL line per check.
# Exit 0 when every check passed, 1 when one failed, 2 when it could not run (no dotnet, tmux or python3).
# Set TERMLOCUS_AOT_BIN to an already published binary to skip the publish (for trying the checks quickly).
set -uo pipefail

root=$(cd "$(dirname "$0")/../.." && pwd)
for tool in dotnet tmux python3; do
  command -v "$tool" >/dev/null 2>&1 || { echo "aot-smoke: $tool is not installed" >&2; exit 2; }
done

work=$(mktemp -d)
sock="$work/tmux.sock"
tm() { tmux -S "$sock" "$@"; }
cleanup() { tm kill-server >/dev/null 2>&1; sleep 0.3; rm -rf "$work"; }
trap cleanup EXIT

passed=0
failed=0
check() { # check DESCRIPTION COMMAND...: one PASS or FAIL line
  local what=$1; shift
  if "$@"; then passed=$((passed + 1)); echo "PASS $what"; else failed=$((failed + 1)); echo "FAIL $what"; fi
}

# --- publish -------------------------------------------------------------------------------------------------------
out="$work/publish"
if [ -n "${TERMLOCUS_AOT_BIN:-}" ]; then
  bin=$TERMLOCUS_AOT_BIN
  echo "aot-smoke: using $bin (publish skipped)"
else
  echo "aot-smoke: dotnet publish src/TermLocus -c Release (NativeAOT)"
  start=$SECONDS
  dotnet publish "$root/src/TermLocus" -c Release -o "$out" -nologo >"$work/publish.log" 2>&1
  status=$?
  seconds=$((SECONDS - start))
  echo "aot-smoke: publish took ${seconds} s (exit $status)"
  bin="$out/termlocus"
  check "publish succeeded" [ "$status" -eq 0 ]
  # IL2xxx/IL3xxx are the trim and AOT analysis warnings (errors here, since warnings are errors); any other
  # warning counts too.
  warnings=$(grep -Ec ' (warning|error) (IL[0-9]+|CS[0-9]+|NETSDK[0-9]+)' "$work/publish.log")
  check "publish printed no trim/AOT or compiler warning ($warnings)" [ "$warnings" -eq 0 ]
  if [ "$status" -ne 0 ] || [ "$warnings" -ne 0 ]; then
    grep -E ' (warning|error) ' "$work/publish.log" | sort -u | head -40 | sed 's/^/     | /'
  fi
  extra=$(cd "$out" 2>/dev/null && ls | grep -Ev '^termlocus(\.dbg)?$' | tr '\n' ' ')
  check "publish folder holds only the executable (and termlocus.dbg)${extra:+; also: $extra}" [ -z "$extra" ]
  check "termlocus is a native ELF executable, not a managed one" \
    sh -c "head -c 4 '$bin' | grep -q ELF && [ ! -e '$out/termlocus.dll' ]"
  size=$(stat -c %s "$bin" 2>/dev/null || echo 0)
  echo "aot-smoke: termlocus is $((size / 1024 / 1024)) MB"
fi
if [ ! -x "$bin" ]; then
  echo "FAIL no executable at $bin"
  echo "aot-smoke: $passed passed, $((failed + 1)) failed"
  exit 1
fi
cp -r "$root/plants" "$work/plants"
cd "$work" || exit 2

# --- verbs ---------------------------------------------------------------------------------------------------------
"$bin" check plants/*.toml >"$work/check.out" 2>"$work/check.err"
status=$?
check "check plants/*.toml exits 1 (the magnetic bearing fails its specs by design)" [ "$status" -eq 1 ]
check "check prints a report with a verdict for each plant" \
  [ "$(grep -c 'verdict:' "$work/check.out")" -eq "$(ls plants/*.toml | wc -l)" ]
check "check names the failing spec" grep -q 'verdict: FAIL .*max_time_to_half' "$work/check.out"
check "check printed nothing on stderr" [ ! -s "$work/check.err" ]

"$bin" analyze --json plants/conveyor-speed.toml >"$work/analyze.json" 2>"$work/analyze.err"
status=$?
check "analyze --json exits 0" [ "$status" -eq 0 ]
check "analyze --json output parses as JSON with its schema name" python3 -c '
import json, sys
doc = json.load(open(sys.argv[1]))
sys.exit(0 if doc.get("schema", "").startswith("termlocus.analyze/") else 1)' "$work/analyze.json"

# --- workbench in tmux at 120x40 -----------------------------------------------------------------------------------
screen() { tm capture-pane -p -t smoke; }
wait_for() { # wait_for REGEX [SECONDS]: true once the screen matches
  local deadline=$((SECONDS + ${2:-20}))
  while [ $SECONDS -lt $deadline ]; do
    screen | grep -Eq "$1" && return 0
    sleep 0.2
  done
  echo "     (screen did not show /$1/ in time; it shows:)"; screen | sed 's/^/     | /'
  return 1
}
flag() { tm display-message -p -t smoke "#{$1}"; }

tm new-session -d -s smoke -x 120 -y 40 \
  "env -i HOME=$work HISTFILE=/dev/null PATH=$PATH TERM=tmux-256color LANG=C.UTF-8 PS1='SMOKE-PROMPT\$ ' bash --norc --noprofile -i"
tm set-option -t smoke remain-on-exit on >/dev/null
wait_for 'SMOKE-PROMPT' 10 >/dev/null
tm send-keys -t smoke "clear; $bin plants/conveyor-speed.toml; echo exit=\$?" Enter
check "workbench opens at 120x40 on the conveyor plant" wait_for 'closed-loop poles'
check "alternate screen is on while it runs" [ "$(flag alternate_on)" = 1 ]
check "the swept value starts at Kp = 6" wait_for 'Kp = 6 '
tm send-keys -t smoke Right Right
check "two right arrows step to Kp = 8" wait_for 'Kp = 8 '
tm send-keys -t smoke Up Down Left Left
check "up, down, two left arrows come back to Kp = 6" wait_for 'Kp = 6 '
screen >"$work/pane.txt"
check "the captured pane shows the s-plane and the pole table" \
  sh -c "grep -q 's-plane' '$work/pane.txt' && grep -q 'closed-loop poles' '$work/pane.txt'"
tm send-keys -t smoke q
sleep 0.5
if screen | grep -q 'quit without saving'; then tm send-keys -t smoke d; fi
check "q quits with exit 0" wait_for '^exit=0' 10
check "the shell prompt is back" sh -c "tmux -S '$sock' capture-pane -p -t smoke | grep -q 'SMOKE-PROMPT\\$ *\$'"
screen_given_back() { [ "$(flag alternate_on)" = 0 ] && [ "$(flag cursor_flag)" = 1 ]; }
check "alternate screen is off and the cursor visible again" screen_given_back

echo "aot-smoke: $passed passed, $failed failed"
[ "$failed" -eq 0 ]
