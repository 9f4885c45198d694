namespace TermLocus.Core.Tests.Plants;

/// <summary>A fresh folder under the system temp folder, deleted (permissions restored first) on dispose.</summary>
internal sealed class TemporaryFolder : IDisposable
{
    public TemporaryFolder() =>
        Path = Directory.CreateDirectory(System.IO.Path.Combine(System.IO.Path.GetTempPath(), "termlocus-test-" + Guid.NewGuid().ToString("N"))).FullName;

    public string Path { get; }

    public string File(string name) => System.IO.Path.Combine(Path, name);

    public void Dispose()
    {
        if (!OperatingSystem.IsWindows())
        {
            System.IO.File.SetUnixFileMode(Path, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);
        }

        Directory.Delete(Path, recursive: true);
    }
}
