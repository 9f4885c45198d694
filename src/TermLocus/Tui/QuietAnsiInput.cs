using System.Runtime.InteropServices;
using Terminal.Gui.Drivers;

namespace TermLocus.Tui;

/// <summary>
/// Terminal.Gui 2.5's ANSI input, made to sleep in the kernel while the keyboard is idle. The toolkit's input loop asks
/// <see cref="Peek"/> whether a byte is waiting and, when none is, sleeps 20 ms and asks again: 50 wake-ups a second,
/// which was most of an idle workbench's CPU. Here <see cref="Peek"/> first blocks in poll(2) on the terminal and on
/// a wake-up descriptor for up to <see cref="LongestWait"/>, so an idle workbench wakes a few times a second, a key
/// is seen the moment it arrives, and <see cref="WakeUp"/> lets shutdown end the wait at once (the toolkit's stop
/// waits for the input loop to return). Linux only (eventfd); elsewhere the toolkit's own input is used.
/// </summary>
internal sealed partial class QuietAnsiInput : AnsiInput
{
    /// <summary>The longest one wait blocks; it bounds how late shutdown is if <see cref="WakeUp"/> is never called.</summary>
    public const int LongestWait = 500;

    private const short PollIn = 0x001;
    private const int EventFdNonBlocking = 0x800;
    private const int EventFdCloseOnExec = 0x80000;

    private readonly int wakeFd;
    private readonly PollFd[] watched;
    private int disposed;
    private bool reading;

    public QuietAnsiInput()
    {
        wakeFd = EventFd(0, EventFdNonBlocking | EventFdCloseOnExec);
        watched = [new PollFd { Fd = 0, Events = PollIn }, new PollFd { Fd = wakeFd, Events = PollIn }];
    }

    /// <summary>True when the kernel gave the wake-up descriptor this input needs.</summary>
    public bool CanWait => wakeFd >= 0;

    /// <summary>
    /// Called on the input thread once what was waiting has been read into the toolkit's queue (see
    /// <see cref="MainLoopPacer.Wake"/>); null for none.
    /// </summary>
    public Action? InputArrived { get; set; }

    public override bool Peek()
    {
        if (base.Peek())
        {
            // The toolkit reads and queues it next, then asks again: the main loop is told then, below.
            reading = true;
            return true;
        }

        if (reading)
        {
            reading = false;
            InputArrived?.Invoke();
        }

        if (CanWait && Volatile.Read(ref disposed) == 0)
        {
            watched[0].Revents = 0;
            watched[1].Revents = 0;
            _ = Poll(watched, (nuint)watched.Length, LongestWait);
        }

        return base.Peek();
    }

    /// <summary>Ends a wait in progress (and the next one) so the input loop can see that it is being stopped.</summary>
    public void WakeUp()
    {
        if (CanWait && Volatile.Read(ref disposed) == 0)
        {
            ulong one = 1;
            _ = Write(wakeFd, ref one, sizeof(ulong));
        }
    }

    public override void Dispose()
    {
        if (Interlocked.Exchange(ref disposed, 1) == 0 && wakeFd >= 0)
        {
            _ = Close(wakeFd);
        }

        base.Dispose();
    }

    [StructLayout(LayoutKind.Sequential)]
    private struct PollFd
    {
        public int Fd;
        public short Events;
        public short Revents;
    }

    [LibraryImport("libc", EntryPoint = "poll", SetLastError = true)]
    private static partial int Poll([In, Out] PollFd[] fds, nuint count, int timeoutMs);

    [LibraryImport("libc", EntryPoint = "eventfd", SetLastError = true)]
    private static partial int EventFd(uint initial, int flags);

    [LibraryImport("libc", EntryPoint = "write", SetLastError = true)]
    private static partial nint Write(int fd, ref ulong value, nuint count);

    [LibraryImport("libc", EntryPoint = "close", SetLastError = true)]
    private static partial int Close(int fd);
}
