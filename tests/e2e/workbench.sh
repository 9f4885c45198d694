#!/usr/bin/env bash
# End-to-end check of the real `termlocus` workbench in tmux at 80x24: step the swept value and see the pole table
# change, step the toleranced parameter through its band (up arrow), show and hide the step response (t), open and
# close help, quit (answering the unsaved-value question), end a second run with SIGTERM, and check
# after each run that the terminal was given back: the shell prompt is there, the alternate screen and mouse
# reporting are off and the cursor is visible. Uses a private tmux server, a copy of the demo plants and a fresh build.
# Exit 0 when every check passed, 1 when one failed, 2 when it could not run (no tmux or dotnet).
set -uo pipefail

root=$(cd "$(dirname "$0")/../.." && pwd)
for tool in tmux dotnet; do
  command -v "$tool" >/dev/null 2>&1 || { echo "e2e: $tool is not installed" >&2; exit 2; }
done

work=$(mktemp -d)
sock="$work/tmux.sock"
tm() { tmux -S "$sock" "$@"; }
cleanup() { tm kill-server >/dev/null 2>&1; sleep 0.3; rm -rf "$work"; }
trap cleanup EXIT

echo "e2e: building termlocus"
if ! dotnet build "$root/src/TermLocus" -o "$work/bin" -nologo -v q >"$work/build.log" 2>&1; then
  cat "$work/build.log" >&2
  echo "e2e: build failed" >&2
  exit 2
fi
cp -r "$root/plants" "$work/plants"

passed=0
failed=0
check() { # check DESCRIPTION COMMAND...
  local what=$1; shift
  if "$@"; then passed=$((passed + 1)); echo "  ok   $what"; else failed=$((failed + 1)); echo "  FAIL $what"; fi
}
screen() { tm capture-pane -p -t e2e; }
wait_for() { # wait_for REGEX [SECONDS]: true once the screen matches
  local deadline=$((SECONDS + ${2:-20}))
  while [ $SECONDS -lt $deadline ]; do
    screen | grep -Eq "$1" && return 0
    sleep 0.2
  done
  echo "     (screen did not show /$1/ in time; it shows:)"; screen | sed 's/^/     | /'
  return 1
}
gone() { # gone REGEX [SECONDS]: true once the screen no longer matches
  local deadline=$((SECONDS + ${2:-10}))
  while [ $SECONDS -lt $deadline ]; do
    screen | grep -Eq "$1" || return 0
    sleep 0.2
  done
  return 1
}
flag() { tm display-message -p -t e2e "#{$1}"; }
restored() {
  [ "$(flag alternate_on)" = 0 ] && [ "$(flag mouse_any_flag)" = 0 ] && [ "$(flag mouse_sgr_flag)" = 0 ] \
    && [ "$(flag cursor_flag)" = 1 ] && screen | grep -q 'E2E-PROMPT\$ *$'
}
pole_rows() { screen | sed -n '/closed-loop poles/,/^└/p' | grep -E '^│...-?[0-9]'; }

# A plain interactive shell with a known prompt, so "the prompt is back" can be seen.
tm new-session -d -s e2e -x 80 -y 24 \
  "env -i HOME=$work HISTFILE=/dev/null PATH=$PATH TERM=tmux-256color LANG=C.UTF-8 PS1='E2E-PROMPT\$ ' bash --norc --noprofile -i"
tm set-option -t e2e remain-on-exit on >/dev/null
wait_for 'E2E-PROMPT' 10 >/dev/null

echo "e2e: run 1 (keys, help, quit)"
tm send-keys -t e2e "cd $work && $work/bin/termlocus plants/conveyor-speed.toml; echo exit=\$?" Enter
check "workbench opens on the plant" wait_for 'closed-loop poles'
check "value starts at the file's Kp = 6" wait_for 'Kp = 6 '
check "alternate screen is on while running" [ "$(flag alternate_on)" = 1 ]
before=$(pole_rows)
tm send-keys -t e2e Right Right
check "two right-arrow steps give Kp = 8" wait_for 'Kp = 8 '
after=$(pole_rows)
check "the pole table changed" [ -n "$after" -a "$before" != "$after" ]
check "the value is marked unsaved" wait_for 'unsaved'
tm send-keys -t e2e Up
check "up arrow steps J a tenth of its band (0.42 to 0.44)" wait_for 'J = 0.44 kg'
check "the panel gives its offset from nominal" wait_for '\(\+4\.8 %\)'
check "the pole table has the band columns" wait_for 'ζ band'
tm send-keys -t e2e 0
check "0 puts J back to nominal" wait_for 'J = 0.42 kg\*m\^2 \(nominal\)'
tm send-keys -t e2e t
check "t shows the step response in place of the plane" wait_for 'step response at Kp = 8'
check "the response figures are shown beside the estimates" wait_for 'overshoot %'
tm send-keys -t e2e Right
check "the response follows the next step" wait_for 'step response at Kp = 9'
tm send-keys -t e2e Left t
check "t again brings the plane back" wait_for '▸ s-plane'
tm send-keys -t e2e '?'
check "? opens help generated from the key table" wait_for 'step the swept value up'
tm send-keys -t e2e Escape
check "Esc closes help" gone 'step the swept value up'
check "Esc did not quit" wait_for 'closed-loop poles' 2
tm send-keys -t e2e q
check "q with an unsaved value asks first" wait_for 'is not saved in conveyor-speed.toml'
tm send-keys -t e2e d
check "d quits and the shell reports exit 0" wait_for '^exit=0'
check "terminal restored (prompt back, alternate screen, mouse off, cursor on)" restored
check "quitting without saving left the plant file alone" cmp -s "$root/plants/conveyor-speed.toml" "$work/plants/conveyor-speed.toml"

echo "e2e: run 2 (SIGTERM with an unsaved value)"
tm send-keys -t e2e "clear; $work/bin/termlocus plants/conveyor-speed.toml; echo exit=\$?" Enter
wait_for 'Kp = 6 ' >/dev/null
tm send-keys -t e2e Right
wait_for 'Kp = 7 ' >/dev/null
pid=$(pgrep -n -f "^$work/bin/termlocus" || true)
[ -n "$pid" ] && kill -TERM "$pid"
check "SIGTERM ends it with exit 143" wait_for '^exit=143'
check "terminal restored after SIGTERM" restored
check "the unsaved value went to the recovery file" grep -q 'value = 7.0' "$work/plants/conveyor-speed.toml.recovery"

echo "e2e: $passed passed, $failed failed"
[ "$failed" -eq 0 ]
