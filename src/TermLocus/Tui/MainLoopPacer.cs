using System.Runtime.InteropServices;
using Terminal.Gui.App;

namespace TermLocus.Tui;

/// <summary>
/// Paces Terminal.Gui 2.5's main loop by events instead of a fixed sleep. The toolkit sleeps 40 ms a turn through
/// <c>Task.Delay(...).Wait()</c>, which also spins (<c>sched_yield</c>) a dozen times before it blocks: about 25 wake-ups
/// and 300 yields a second while nothing happens, most of an idle workbench's CPU. Here the toolkit's own pause is
/// made zero (a turn budget of 1 ms) and each turn instead starts by blocking, without spinning, until something
/// needs the loop: a key (<see cref="QuietAnsiInput"/> calls <see cref="Wake"/>), a result posted from a worker or a
/// signal (the callers of <c>Invoke</c> call <see cref="Wake"/>), a terminal resize (SIGWINCH), or a timeout: the
/// toolkit's 40 ms pace while keys come (its escape-key and terminal-query timeouts need turns), and
/// <see cref="IdleWait"/> once nothing has happened for <see cref="IdleAfter"/>.
/// </summary>
internal sealed class MainLoopPacer : IDisposable
{
    /// <summary>The longest pause of a turn while the user is active: the toolkit's own pace (25 turns a second).</summary>
    public static readonly TimeSpan ActiveWait = TimeSpan.FromMilliseconds(40);

    /// <summary>The longest pause of a turn when idle: anything that needs the loop wakes it sooner.</summary>
    public static readonly TimeSpan IdleWait = TimeSpan.FromMilliseconds(250);

    /// <summary>Quiet time after which a turn may wait <see cref="IdleWait"/>.</summary>
    public static readonly TimeSpan IdleAfter = TimeSpan.FromSeconds(2);

    // A turn budget of 1 ms leaves the toolkit's own pause at zero whole milliseconds, which it skips.
    private const ushort TurnsPerSecond = 1000;

    private readonly IApplication app;
    private readonly ushort previousTurns;
    private readonly ManualResetEventSlim signal = new(initialState: false, spinCount: 0);
    private readonly PosixSignalRegistration? resize;
    private long lastActivity = Environment.TickCount64;

    /// <summary>Takes over the pacing of <paramref name="app"/>'s main loop until disposed.</summary>
    public MainLoopPacer(IApplication app)
    {
        this.app = app;
        previousTurns = Application.MaximumIterationsPerSecond;
        Application.MaximumIterationsPerSecond = TurnsPerSecond;
        app.Iteration += OnTurn;
        resize = TryRegisterResize();
    }

    /// <summary>Something needs the main loop now (thread-safe; cheap when it is already awake).</summary>
    public void Wake()
    {
        Volatile.Write(ref lastActivity, Environment.TickCount64);
        signal.Set();
    }

    public void Dispose()
    {
        app.Iteration -= OnTurn;
        Application.MaximumIterationsPerSecond = previousTurns;
        resize?.Dispose();
        signal.Set();
    }

    private void OnTurn(object? sender, EventArgs<IApplication?> e)
    {
        long quiet = Environment.TickCount64 - Volatile.Read(ref lastActivity);
        signal.Wait(quiet < (long)IdleAfter.TotalMilliseconds ? ActiveWait : IdleWait);
        // Anything posted before this reset is handled in the turn that follows at once.
        signal.Reset();
    }

    private PosixSignalRegistration? TryRegisterResize()
    {
        if (OperatingSystem.IsWindows())
        {
            return null;
        }

        try
        {
            // The toolkit notices a new size by asking the terminal once a turn; the signal only makes the turn come.
            return PosixSignalRegistration.Create(PosixSignal.SIGWINCH, context =>
            {
                context.Cancel = false;
                Wake();
            });
        }
        catch (Exception e) when (e is PlatformNotSupportedException or IOException)
        {
            return null;
        }
    }
}
