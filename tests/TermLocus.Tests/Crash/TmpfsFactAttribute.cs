namespace TermLocus.Tests.Crash;

/// <summary>A test that mounts a small tmpfs: skipped where this process may not mount one (not root, not Linux).</summary>
internal sealed class TmpfsFactAttribute : FactAttribute
{
    public TmpfsFactAttribute()
    {
        if (OperatingSystem.IsWindows() || !TmpfsMount.Available)
        {
            Skip = "needs root (CAP_SYS_ADMIN) on Linux to mount a tmpfs";
        }
    }
}
