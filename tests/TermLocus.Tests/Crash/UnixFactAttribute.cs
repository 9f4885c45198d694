namespace TermLocus.Tests.Crash;

/// <summary>A test that needs POSIX signals and permission bits: skipped on Windows.</summary>
internal sealed class UnixFactAttribute : FactAttribute
{
    public UnixFactAttribute()
    {
        if (OperatingSystem.IsWindows())
        {
            Skip = "needs SIGKILL and Unix permission bits";
        }
    }
}
