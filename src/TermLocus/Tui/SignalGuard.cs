using System.Runtime.InteropServices;

namespace TermLocus.Tui;

/// <summary>
/// SIGTERM, SIGHUP, SIGINT and SIGQUIT end the workbench the orderly way (recovery file, terminal restored) instead of
/// killing the process mid-screen. .NET 10 no longer turns these into ProcessExit, so they are registered here.
/// </summary>
internal sealed class SignalGuard : IDisposable
{
    private readonly List<PosixSignalRegistration> registrations = [];

    public SignalGuard(Action onSignal)
    {
        foreach (var signal in new[] { PosixSignal.SIGTERM, PosixSignal.SIGHUP, PosixSignal.SIGINT, PosixSignal.SIGQUIT })
        {
            try
            {
                registrations.Add(PosixSignalRegistration.Create(signal, context =>
                {
                    context.Cancel = true;
                    onSignal();
                }));
            }
            catch (PlatformNotSupportedException)
            {
                // Not every signal exists everywhere (SIGQUIT on Windows); the others still work.
            }
        }
    }

    public void Dispose()
    {
        foreach (var registration in registrations)
        {
            registration.Dispose();
        }
    }
}
