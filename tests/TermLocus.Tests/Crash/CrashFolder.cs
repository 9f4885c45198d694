using System.Runtime.Versioning;
using TermLocus.Tests.Cli;

namespace TermLocus.Tests.Crash;

/// <summary>
/// A fresh folder under the system temp folder holding <c>lib/</c> (the plant library the children save into) and
/// room for the tests' other files; deleted on dispose.
/// </summary>
[UnsupportedOSPlatform("windows")]
internal sealed class CrashFolder : IDisposable
{
    /// <summary>
    /// The mode the plant file is given: not what a umask gives a new file, so a save that loses the bits shows, and
    /// private to owner and group, so a recovery copy that kept it is no more readable than the plant.
    /// </summary>
    public const UnixFileMode PlantMode = UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.GroupRead;

    public CrashFolder()
    {
        Root = Directory.CreateDirectory(Path.Combine(Path.GetTempPath(), "termlocus-crash-" + Guid.NewGuid().ToString("N"))).FullName;
        Library = Directory.CreateDirectory(Path.Combine(Root, "lib")).FullName;
    }

    public string Root { get; }

    public string Library { get; }

    public string Plant => Path.Combine(Library, "plant.toml");

    /// <summary>Copies the conveyor demo plant to <see cref="Plant"/> with <see cref="PlantMode"/>.</summary>
    public void PlaceDemoPlant()
    {
        File.Copy(RepoFiles.Plant("conveyor-speed.toml"), Plant);
        File.SetUnixFileMode(Plant, PlantMode);
    }

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
