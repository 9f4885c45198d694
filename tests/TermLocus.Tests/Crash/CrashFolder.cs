using System.Runtime.Versioning;

namespace TermLocus.Tests.Crash;

/// <summary>
/// A fresh folder under the system temp folder holding <c>lib/</c> (the plant library the children save into) and
/// room for the tests' other files; deleted on dispose.
/// </summary>
[UnsupportedOSPlatform("windows")]
internal sealed class CrashFolder : IDisposable
{
    public CrashFolder()
    {
        Root = Directory.CreateDirectory(Path.Combine(Path.GetTempPath(), "termlocus-crash-" + Guid.NewGuid().ToString("N"))).FullName;
        Library = Directory.CreateDirectory(Path.Combine(Root, "lib")).FullName;
    }

    public string Root { get; }

    public string Library { get; }

    public string Plant => Path.Combine(Library, "plant.toml");

    public string Sub(string name) => Directory.CreateDirectory(Path.Combine(Root, name)).FullName;

    public void Dispose()
    {
        foreach (var folder in Directory.GetDirectories(Root).Append(Root))
        {
            File.SetUnixFileMode(folder, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);
        }

        Directory.Delete(Root, recursive: true);
    }
}
