#!/usr/bin/env python3
"""Measures the termlocus workbench the way a user's terminal sees it (standard library only, plus tmux).

In a pseudo-terminal of COLSxROWS (python's pty module) it runs the binary under /usr/bin/time -v and records:
  - time to first frame: from starting the process to the first complete frame (the last screen row written),
    and to "settled" (the last byte before the screen goes quiet, i.e. the plant loaded and its locus drawn);
  - bytes written to the terminal for each arrow-key step (right arrows, then as many left arrows), and for a
    full repaint (F5) to compare with;
  - bytes written and CPU used while idle for IDLE seconds (CPU from /proc/<pid>/stat);
  - peak resident memory (from /usr/bin/time -v) over the whole run.
The pseudo-terminal answers the queries a terminal answers (cursor position, device attributes, colours), like
xterm would, so start-up is not held up waiting for replies that never come.

In tmux at the same size it then measures the floors each step is compared with: the cells whose character or
colour changed (captured with `tmux capture-pane -e` before and after the step), their bytes alone, and their bytes
plus one cursor move per run of changed cells; and the bytes tmux received for the step (pipe-pane), as a check.
With --floor-bin it also runs tests/perf/PollFloor for the idle-CPU floor: the CPU that the idle waits (the main
loop's turn, at most 250 ms; the input wait, at most 500 ms then 20 ms) cost on their own here.

Prints one line per figure and, with --json FILE, writes them all. Exit 1 when a budget is missed and --strict.
"""
import argparse
import json
import os
import pty
import re
import select
import signal
import statistics
import struct
import subprocess
import sys
import tempfile
import termios
import fcntl
import time

BUDGETS = {  # figure: (limit, unit); from the project's terminal UX promises
    "first_frame_ms": (150, "ms"),
    "peak_rss_mb": (80, "MB"),
    "step_bytes_median": (6 * 1024, "B"),
    "idle_bytes_per_s": (400, "B/s"),
    "idle_cpu_pct": (1.0, "% of a core"),
}

QUIET_S = 0.30  # output is over when nothing arrives for this long


class Pty:
    """termlocus under /usr/bin/time -v in a pseudo-terminal of a fixed size, answering terminal queries."""

    def __init__(self, binary, args, cols, rows, cwd, time_file, nice=None):
        self.cols, self.rows = cols, rows
        env = {"TERM": "xterm-256color", "LANG": "C.UTF-8", "HOME": os.environ.get("HOME", "/tmp"),
               "PATH": "/usr/bin:/bin"}
        self.start = time.monotonic()
        pid, fd = pty.fork()
        if pid == 0:
            fcntl.ioctl(0, termios.TIOCSWINSZ, struct.pack("HHHH", rows, cols, 0, 0))
            os.chdir(cwd)
            command = ["/usr/bin/nice", "-n", str(nice), binary] if nice is not None else [binary]
            os.execve("/usr/bin/time", ["/usr/bin/time", "-v", "-o", time_file, *command, *args], env)
        self.pid, self.fd = pid, fd
        self.log = []  # (seconds since start, bytes)
        self.pending = b""

    def answer(self, data):
        # Replies an xterm would give; Terminal.Gui asks at start-up and now and then (background colour).
        self.pending = (self.pending + data)[-64:]
        replies = []
        if b"\x1b[6n" in data:
            replies.append(b"\x1b[1;1R")
        if b"\x1b[0c" in data or b"\x1b[c" in data:
            replies.append(b"\x1b[?64;1;2;6;9;15;18;21;22c")
        if b"\x1b]10;?" in data:
            replies.append(b"\x1b]10;rgb:d0d0/d0d0/d0d0\x1b\\")
        if b"\x1b]11;?" in data:
            replies.append(b"\x1b]11;rgb:1c1c/1c1c/1c1c\x1b\\")
        for r in replies:
            os.write(self.fd, r)

    def pump(self, seconds=None, until_quiet=None, until=None):
        """Reads output for `seconds`, or until quiet for `until_quiet` s, or until `until(all_bytes)`; returns bytes."""
        got = bytearray()
        deadline = time.monotonic() + (seconds if seconds is not None else 30)
        last = time.monotonic()
        while time.monotonic() < deadline:
            wait = 0.01 if until_quiet is None else max(0.0, min(0.01, last + until_quiet - time.monotonic()))
            ready, _, _ = select.select([self.fd], [], [], wait)
            now = time.monotonic()
            if ready:
                try:
                    data = os.read(self.fd, 65536)
                except OSError:
                    break
                if not data:
                    break
                self.log.append((now - self.start, data))
                self.answer(data)
                got += data
                last = now
                if until is not None and until(bytes(got)):
                    break
            elif until_quiet is not None and now - last >= until_quiet and got:
                break
        return bytes(got)

    def send(self, keys):
        os.write(self.fd, keys)

    def wait(self, timeout=10):
        deadline = time.monotonic() + timeout
        while time.monotonic() < deadline:
            self.pump(seconds=0.05)
            pid, status = os.waitpid(self.pid, os.WNOHANG)
            if pid:
                return os.waitstatus_to_exitcode(status)
        os.kill(self.pid, signal.SIGKILL)
        os.waitpid(self.pid, 0)
        return None

    def app_pid(self):
        # The program is the only child of /usr/bin/time.
        for _ in range(100):
            try:
                with open(f"/proc/{self.pid}/task/{self.pid}/children") as f:
                    kids = f.read().split()
                if kids:
                    return int(kids[0])
            except OSError:
                pass
            time.sleep(0.01)
        raise RuntimeError("cannot find the program's process")


def cpu_seconds(pid):
    with open(f"/proc/{pid}/stat") as f:
        fields = f.read().rsplit(")", 1)[1].split()
    return (int(fields[11]) + int(fields[12])) / os.sysconf("SC_CLK_TCK")  # utime + stime


def peak_rss_mb(time_file):
    with open(time_file) as f:
        m = re.search(r"Maximum resident set size \(kbytes\): (\d+)", f.read())
    return int(m.group(1)) / 1024 if m else None


def frame_times(log, rows):
    """(first frame complete, settled) in ms: the first write to the last row, and the last byte before quiet."""
    last_row = f"\x1b[{rows};".encode()
    first = None
    seen = b""
    for t, data in log:
        seen += data
        if first is None and last_row in seen:
            first = t
        seen = seen[-len(last_row):]
    settled = log[-1][0] if log else None
    return (first * 1000 if first is not None else None, settled * 1000 if settled is not None else None)


def start_run(opts, time_file, interactive):
    p = Pty(opts.bin, [opts.plant], opts.cols, opts.rows, opts.cwd, time_file, opts.nice)
    last_row = f"\x1b[{opts.rows};".encode()
    p.pump(seconds=15, until=lambda b: last_row in b)  # the first frame
    first_cpu = cpu_seconds(p.app_pid())
    p.pump(seconds=15, until_quiet=0.6)  # plant load and trace, until the screen holds still
    first, settled = frame_times(p.log, opts.rows)
    result = {"first_frame_ms": first, "settled_ms": settled, "first_frame_cpu_ms": first_cpu * 1000,
              "first_output_ms": p.log[0][0] * 1000 if p.log else None}
    if interactive:
        pid = p.app_pid()
        steps = []
        for key in [b"\x1b[C"] * opts.steps + [b"\x1b[D"] * opts.steps:
            sent, first = time.monotonic(), len(p.log)
            p.send(key)
            out = p.pump(seconds=5, until_quiet=QUIET_S)
            steps.append({
                "bytes": len(out),
                # Key to the first byte drawn, and to the last (a band verdict checked off the UI thread comes later).
                "first_ms": round((p.log[first][0] + p.start - sent) * 1000, 1) if out else None,
                "settled_ms": round((p.log[-1][0] + p.start - sent) * 1000, 1) if out else None,
            })
        p.send(b"\x1b[15~")  # F5: Terminal.Gui repaints the whole screen, the figure a step is compared with
        repaint = p.pump(seconds=5, until_quiet=QUIET_S)
        result["full_repaint_bytes"] = len(repaint)
        cpu0 = cpu_seconds(pid)
        t0 = time.monotonic()
        idle = p.pump(seconds=opts.idle)
        span = time.monotonic() - t0
        cpu1 = cpu_seconds(pid)
        result.update({
            "steps": steps,
            "idle_seconds": round(span, 2),
            "idle_bytes": len(idle),
            "idle_bytes_per_s": len(idle) / span,
            "idle_cpu_pct": 100 * (cpu1 - cpu0) / span,
        })
    p.send(b"q")
    code = p.wait()
    result["exit_code"] = code
    result["peak_rss_mb"] = peak_rss_mb(time_file)
    return result


# ---- floors in tmux ---------------------------------------------------------------------------------------------

SGR = re.compile(r"\x1b\[([0-9;]*)m")


def parse_pane(text, cols):
    """Cells (character, attribute tuple) per row from `capture-pane -e -p` output."""
    screen = []
    for line in text.split("\n"):
        cells, attr, i = [], (), 0
        while i < len(line):
            m = SGR.match(line, i)
            if m:
                codes = [c for c in m.group(1).split(";") if c != ""] or ["0"]
                attr = apply_sgr(attr, codes)
                i = m.end()
                continue
            cells.append((line[i], attr))
            i += 1
        cells += [(" ", ())] * (cols - len(cells))
        screen.append(cells[:cols])
    return screen


def apply_sgr(attr, codes):
    state = dict(attr)
    j = 0
    while j < len(codes):
        c = int(codes[j])
        if c == 0:
            state = {}
        elif c in (38, 48) and j + 1 < len(codes):
            n = 3 if codes[j + 1] == "5" else 5
            state["fg" if c == 38 else "bg"] = ";".join(codes[j:j + n])
            j += n - 1
        elif 30 <= c <= 37 or 90 <= c <= 97:
            state["fg"] = str(c)
        elif c == 39:
            state.pop("fg", None)
        elif 40 <= c <= 47 or 100 <= c <= 107:
            state["bg"] = str(c)
        elif c == 49:
            state.pop("bg", None)
        elif 1 <= c <= 9:
            state[f"s{c}"] = True
        elif 21 <= c <= 29:
            state.pop(f"s{c - 20}", None)
            if c == 22:
                state.pop("s1", None)
                state.pop("s2", None)
        j += 1
    return tuple(sorted(state.items()))


def changed_cells(before, after):
    runs, cells, char_bytes, move_bytes = 0, 0, 0, 0
    for r, (a, b) in enumerate(zip(before, after)):
        in_run = False
        for c, (x, y) in enumerate(zip(a, b)):
            if x != y:
                cells += 1
                char_bytes += len(y[0].encode())
                if not in_run:
                    runs += 1
                    move_bytes += len(f"\x1b[{r + 1};{c + 1}H")
                in_run = True
            else:
                in_run = False
    return {"cells": cells, "runs": runs, "char_bytes": char_bytes, "with_moves_bytes": char_bytes + move_bytes}


def tmux_floors(opts):
    work = tempfile.mkdtemp(prefix="termlocus-perf-")
    sock = os.path.join(work, "tmux.sock")
    raw = os.path.join(work, "raw.bin")

    def tm(*args):
        return subprocess.run(["tmux", "-S", sock, *args], capture_output=True, text=True).stdout

    def pane():
        return tm("capture-pane", "-e", "-p", "-t", "perf")

    def quiet():  # until tmux received nothing for QUIET_S and the pane holds still
        size, still = -1, 0
        while still < 3:
            time.sleep(QUIET_S / 3)
            now = os.path.getsize(raw) if os.path.exists(raw) else 0
            still = still + 1 if now == size else 0
            size = now
        return size

    try:
        tm("new-session", "-d", "-s", "perf", "-x", str(opts.cols), "-y", str(opts.rows), "-c", opts.cwd,
           f"env TERM=tmux-256color LANG=C.UTF-8 {opts.bin} {opts.plant}; sleep 2")
        tm("pipe-pane", "-o", "-t", "perf", f"cat >> {raw}")
        time.sleep(1.0)
        quiet()
        steps = []
        for key in ["Right"] * opts.steps + ["Left"] * opts.steps:
            before_text, before_size = pane(), quiet()
            tm("send-keys", "-t", "perf", key)
            after_size = quiet()
            after_text = pane()
            floor = changed_cells(parse_pane(before_text, opts.cols), parse_pane(after_text, opts.cols))
            floor["tmux_received_bytes"] = after_size - before_size
            steps.append(floor)
        tm("send-keys", "-t", "perf", "q")
        time.sleep(0.5)
        return steps
    finally:
        tm("kill-server")
        subprocess.run(["rm", "-rf", work])


def idle_cpu_floor(floor_bin, seconds):
    """CPU % of a core used by the PollFloor program (the workbench's idle waits and nothing else)."""
    with tempfile.NamedTemporaryFile("r") as out:
        subprocess.run(["/usr/bin/time", "-f", "%U %S %e", "-o", out.name, floor_bin, str(seconds)], check=True)
        user, system, wall = (float(x) for x in out.read().split()[-3:])
    return 100 * (user + system) / wall


def median(values):
    values = [v for v in values if v is not None]
    return statistics.median(values) if values else None


def main():
    ap = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    ap.add_argument("--bin", required=True, help="the termlocus executable (the NativeAOT build)")
    ap.add_argument("--plant", default="plants/conveyor-speed.toml")
    ap.add_argument("--cwd", default=os.getcwd(), help="folder the plant path is relative to")
    ap.add_argument("--cols", type=int, default=120)
    ap.add_argument("--rows", type=int, default=40)
    ap.add_argument("--runs", type=int, default=5, help="start-up runs (the first is also the interactive one)")
    ap.add_argument("--steps", type=int, default=5, help="right-arrow steps, then as many left-arrow steps")
    ap.add_argument("--idle", type=float, default=10.0, help="idle seconds")
    ap.add_argument("--json", help="write every figure to this file")
    ap.add_argument("--strict", action="store_true", help="exit 1 when a budget is missed")
    ap.add_argument("--no-tmux", action="store_true", help="skip the floors measured in tmux")
    ap.add_argument("--floor-bin", help="the published tests/perf/PollFloor program, for the idle-CPU floor")
    ap.add_argument("--nice", type=int, help="run the program under nice -n NICE (e.g. -15 on a busy machine, as root)")
    opts = ap.parse_args()
    opts.bin = os.path.abspath(opts.bin)

    with open("/proc/loadavg") as f:
        load = f.read().split()[0]
    runs = []
    with tempfile.TemporaryDirectory() as tmp:
        for i in range(opts.runs):
            runs.append(start_run(opts, os.path.join(tmp, f"time{i}.txt"), interactive=(i == 0)))
    live = runs[0]
    steps = [s["bytes"] for s in live["steps"]]
    figures = {
        "terminal": f"{opts.cols}x{opts.rows}",
        "plant": opts.plant,
        "load_average_at_start": float(load),
        "nice": opts.nice,
        "first_frame_ms": median(r["first_frame_ms"] for r in runs),
        "first_frame_ms_all": [round(r["first_frame_ms"], 1) if r["first_frame_ms"] else None for r in runs],
        "first_frame_cpu_ms": median(r["first_frame_cpu_ms"] for r in runs),
        "first_output_ms": median(r["first_output_ms"] for r in runs),
        "settled_ms": median(r["settled_ms"] for r in runs),
        "peak_rss_mb": max(r["peak_rss_mb"] or 0 for r in runs),
        "step_bytes_median": median(steps),
        "step_bytes_max": max(steps),
        "step_bytes_all": steps,
        "step_first_byte_ms_median": median(s["first_ms"] for s in live["steps"]),
        "step_settled_ms_median": median(s["settled_ms"] for s in live["steps"]),
        "full_repaint_bytes": live["full_repaint_bytes"],
        "idle_seconds": live["idle_seconds"],
        "idle_bytes_per_s": live["idle_bytes_per_s"],
        "idle_cpu_pct": live["idle_cpu_pct"],
        "exit_codes": [r["exit_code"] for r in runs],
    }
    if opts.floor_bin:
        figures["idle_cpu_floor_pct"] = idle_cpu_floor(os.path.abspath(opts.floor_bin), opts.idle)
    if not opts.no_tmux:
        floors = tmux_floors(opts)
        figures.update({
            "floor_changed_cells_median": median(f["cells"] for f in floors),
            "floor_char_bytes_median": median(f["char_bytes"] for f in floors),
            "floor_with_moves_bytes_median": median(f["with_moves_bytes"] for f in floors),
            "tmux_step_bytes_median": median(f["tmux_received_bytes"] for f in floors),
            "floors_all": floors,
        })

    missed = []
    nice = f", nice {opts.nice}" if opts.nice is not None else ""
    print(f"termlocus {opts.bin} at {figures['terminal']} on {opts.plant} (load average {load} at start{nice})")
    for key, value in figures.items():
        if key.endswith("_all") or isinstance(value, (list, dict)):
            continue
        line = f"  {key:32} {round(value, 2) if isinstance(value, float) else value}"
        if key in BUDGETS:
            limit, unit = BUDGETS[key]
            ok = value is not None and value < limit
            line += f"   budget < {limit} {unit}: {'PASS' if ok else 'MISSED'}"
            if not ok:
                missed.append(key)
        print(line)
    print(f"  first frames (ms)                {figures['first_frame_ms_all']}")
    print(f"  bytes per step                   {figures['step_bytes_all']}")
    if opts.json:
        with open(opts.json, "w") as f:
            json.dump(figures, f, indent=2)
    if any(code != 0 for code in figures["exit_codes"]):
        print(f"  a run did not exit 0: {figures['exit_codes']}")
        missed.append("exit_code")
    return 1 if (missed and opts.strict) else 0


if __name__ == "__main__":
    sys.exit(main())
