#!/usr/bin/env bash
# End-to-end check of the real `termlocus` workbench in tmux at 80x24: step the swept value and see the pole table
# change, step the toleranced parameter through its band (up arrow) and make the band step finer ({), show and hide
# the step response (t), open and close help, quit (answering the unsaved-value question), end a second run with
# SIGTERM and see the recovery file offered and applied on the next start, change the plant file on disk while it is
# open and save under another name, delete it while open and write it again; and check after each run that the
# terminal was given back: the shell prompt is there, the alternate screen and mouse reporting are off and the cursor
# is visible. Uses a private tmux server, a copy of the demo plants and a fresh build.
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
gone_file() { # gone_file PATH [SECONDS]: true once PATH does not exist
  local deadline=$((SECONDS + ${2:-10}))
  while [ $SECONDS -lt $deadline ]; do
    [ -e "$1" ] || return 0
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
tm send-keys -t e2e '{'
check "{ makes the band step finer, shown in the panel" wait_for 'band step 1/20'
tm send-keys -t e2e Up
check "up arrow then steps J a twentieth of its band (0.42 to 0.4225)" wait_for 'J = 0.4225 kg'
tm send-keys -t e2e 0
wait_for 'J = 0.42 kg\*m\^2 \(nominal\)' >/dev/null
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

plant="$work/plants/conveyor-speed.toml"
value_in() { grep -E '^Kp +=' "$1" | grep -Eo 'value = [0-9.]+'; }

echo "e2e: run 3 (the recovery file offered on the next start)"
tm send-keys -t e2e "clear; $work/bin/termlocus plants/conveyor-speed.toml; echo exit=\$?" Enter
check "the recovery file is offered on start" wait_for 'recovery file found'
check "it says what it holds" wait_for 'It holds Kp = 7; conveyor-speed.toml has 6'
tm send-keys -t e2e a
check "a applies it: Kp = 7 is shown" wait_for 'Kp = 7 A/\(rad/s\)'
check "the applied value is unsaved" wait_for 'unsaved \(file: 6\)'
check "applying wrote nothing to the plant" [ "$(value_in "$plant")" = "value = 6.0" ]
tm send-keys -t e2e s
wait_for 'save the operating point' >/dev/null
tm send-keys -t e2e Enter
check "saving it writes Kp = 7 into the plant" wait_for 'saved Kp = 7 to conveyor-speed.toml'
check "the plant file holds 7.0" [ "$(value_in "$plant")" = "value = 7.0" ]
check "and the recovery file is gone once saved" gone_file "$plant.recovery"
tm send-keys -t e2e q
check "q quits with nothing unsaved" wait_for '^exit=0'

echo "e2e: run 4 (the plant file changed on disk while open)"
tm send-keys -t e2e "clear; $work/bin/termlocus plants/conveyor-speed.toml; echo exit=\$?" Enter
wait_for 'Kp = 7 ' >/dev/null
tm send-keys -t e2e Right Right
wait_for 'Kp = 9 ' >/dev/null
echo "# edited by another program" >>"$plant"
check "the status line notices the change on disk" wait_for 'conveyor-speed.toml changed on disk'
tm send-keys -t e2e s
check "s offers the choice instead of saving" wait_for 'the plant file changed on disk'
check "the choice offers reading it again" wait_for 'r +read it again from disk; Kp = 9 stays'
check "and saving under another name" wait_for 'a +save under another name \(conveyor-speed.2.toml'
check "the plant file was not written" grep -q '^# edited by another program' "$plant"
tm send-keys -t e2e a
check "a opens the path entry, prefilled" wait_for 'conveyor-speed.2.toml_'
tm send-keys -t e2e Enter
check "saved under the new name, now the open file" wait_for 'saved Kp = 9 to conveyor-speed.2.toml, now the open file'
check "the new file holds Kp = 9" [ "$(value_in "$work/plants/conveyor-speed.2.toml")" = "value = 9.0" ]
check "the new file is the loaded one plus the edit (no foreign line)" bash -c "! grep -q 'edited by another program' '$work/plants/conveyor-speed.2.toml'"
check "the changed file kept its bytes and its value" bash -c "grep -q 'edited by another program' '$plant' && grep -q 'value = 7.0' '$plant'"
tm send-keys -t e2e q
check "q quits" wait_for '^exit=0'

echo "e2e: run 5 (the plant file deleted while open)"
tm send-keys -t e2e "clear; $work/bin/termlocus plants/conveyor-speed.2.toml; echo exit=\$?" Enter
wait_for 'Kp = 9 ' >/dev/null
tm send-keys -t e2e Right
wait_for 'Kp = 10 ' >/dev/null
rm "$work/plants/conveyor-speed.2.toml"
check "the status line notices the file is gone" wait_for 'conveyor-speed.2.toml is gone from disk'
check "the panel says so too" wait_for 'file gone from disk'
tm send-keys -t e2e s
check "s offers saving elsewhere or writing it again" wait_for 'w +write conveyor-speed.2.toml again where it was'
tm send-keys -t e2e Escape
check "Esc writes nothing" wait_for 'not saved: nothing was written'
check "the file is still gone" gone_file "$work/plants/conveyor-speed.2.toml"
tm send-keys -t e2e s
wait_for 'w +write' >/dev/null
tm send-keys -t e2e w
check "w writes it again where it was" wait_for 'saved Kp = 10 to conveyor-speed.2.toml'
check "the file is back with Kp = 10" [ "$(value_in "$work/plants/conveyor-speed.2.toml")" = "value = 10.0" ]
tm send-keys -t e2e q
check "q quits" wait_for '^exit=0'
check "terminal restored" restored

echo "e2e: $passed passed, $failed failed"
[ "$failed" -eq 0 ]
