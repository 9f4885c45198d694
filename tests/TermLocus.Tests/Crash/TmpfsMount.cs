using System.Diagnostics;
using System.Globalization;
using System.Runtime.Versioning;

namespace TermLocus.Tests.Crash;

/// <summary>
/// A small tmpfs mounted on a fresh folder under the system temp folder (needs root, or CAP_SYS_ADMIN): a real
/// file system that fills up (ENOSPC) or can be made read-only (EROFS). Unmounted and removed on dispose.
/// </summary>
[UnsupportedOSPlatform("windows")]
internal sealed class TmpfsMount : IDisposable
{
    private static readonly Lazy<bool> CanMount = new(Probe);

    private TmpfsMount(string path) => Path = path;

    /// <summary>Whether this process may mount a tmpfs here.</summary>
    public static bool Available => CanMount.Value;

    public string Path { get; }

    public static TmpfsMount Create(int kilobytes)
    {
        var path = Directory.CreateDirectory(System.IO.Path.Combine(System.IO.Path.GetTempPath(), "termlocus-tmpfs-" + Guid.NewGuid().ToString("N"))).FullName;
        if (Command("mount", "-t", "tmpfs", "-o", string.Create(CultureInfo.InvariantCulture, $"size={kilobytes}k,mode=0755"), "tmpfs", path) is { } error)
        {
            Directory.Delete(path);
            throw new InvalidOperationException("cannot mount a tmpfs: " + error);
        }

        return new TmpfsMount(path);
    }

    public string File(string name) => System.IO.Path.Combine(Path, name);

    public void RemountReadOnly()
    {
        if (Command("mount", "-o", "remount,ro", Path) is { } error)
        {
            throw new InvalidOperationException("cannot remount read-only: " + error);
        }
    }

    /// <summary>Writes a filler file until the file system is full.</summary>
    public void Fill()
    {
        using var filler = new FileStream(File("filler"), FileMode.CreateNew);
        var block = new byte[4096];
        try
        {
            while (true)
            {
                filler.Write(block);
                filler.Flush();
            }
        }
        catch (IOException)
        {
            // Full: what we wanted.
        }
    }

    public void Dispose()
    {
        _ = Command("umount", Path);
        Directory.Delete(Path, recursive: true);
    }

    private static bool Probe()
    {
        if (!OperatingSystem.IsLinux() || !Environment.IsPrivilegedProcess)
        {
            return false;
        }

        try
        {
            Create(64).Dispose();
            return true;
        }
        catch (Exception e) when (e is InvalidOperationException or System.ComponentModel.Win32Exception or IOException)
        {
            return false;
        }
    }

    // Null when the command succeeded, else its error output.
    private static string? Command(string name, params string[] arguments)
    {
        var start = new ProcessStartInfo(name) { RedirectStandardError = true, RedirectStandardOutput = true, UseShellExecute = false };
        foreach (var argument in arguments)
        {
            start.ArgumentList.Add(argument);
        }

        using var process = Process.Start(start)!;
        string errors = process.StandardError.ReadToEnd();
        process.WaitForExit();
        return process.ExitCode == 0 ? null : $"{name} exited with {process.ExitCode}: {errors.Trim()}";
    }
}
