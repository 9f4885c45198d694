using System.Runtime.InteropServices;

namespace TermLocus.Tui;

/// <summary>
/// Signals end the workbench without losing the chosen value. SIGTERM, SIGINT and SIGQUIT take the orderly way out
/// (recovery file, terminal restored, normal exit). SIGHUP means the terminal is gone (an SSH drop): the recovery file
/// is written at once on the signal's thread and the default action then ends the process, because there is no
/// terminal left to restore and shutting the screen down cleanly could wait on it forever. .NET 10 no longer turns
/// these signals into ProcessExit, so they are registered here.
/// </summary>
internal sealed class SignalGuard : IDisposable
{
    private readonly List<PosixSignalRegistration> registrations = [];

    /// <param name="stop">Asks the UI thread to quit the orderly way (must only post work, not block); gets the
    /// conventional exit code for the signal (128 + its number).</param>
    /// <param name="hangUp">Saves what must be saved, on the signal's thread (must be thread-safe).</param>
    public SignalGuard(Action<int> stop, Action hangUp)
    {
        Register(PosixSignal.SIGHUP, context =>
        {
            hangUp();
            context.Cancel = false;
        });
        foreach (var (signal, number) in new[] { (PosixSignal.SIGTERM, 15), (PosixSignal.SIGINT, 2), (PosixSignal.SIGQUIT, 3) })
        {
            Register(signal, context =>
            {
                context.Cancel = true;
                stop(128 + number);
            });
        }
    }

    public void Dispose()
    {
        foreach (var registration in registrations)
        {
            registration.Dispose();
        }
    }

    private void Register(PosixSignal signal, Action<PosixSignalContext> handler)
    {
        try
        {
            registrations.Add(PosixSignalRegistration.Create(signal, handler));
        }
        catch (PlatformNotSupportedException)
        {
            // Not every signal exists everywhere (SIGQUIT on Windows); the others still work.
        }
    }
}
