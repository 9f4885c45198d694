using System.Diagnostics;
using System.Runtime.Versioning;
using System.Text.RegularExpressions;
using TermLocus.Core.Plants;
using TermLocus.Tests.Cli;

namespace TermLocus.Tests.Crash;

/// <summary>
/// The real <c>termlocus save</c> under a file-size limit (<c>ulimit -f 1</c> in a child shell, 512 or 1024 bytes,
/// smaller than the new file): the write fails with EFBIG as on a full disk, and needs no root. With SIGXFSZ ignored
/// the save must fail with a clear message and keep the file; with SIGXFSZ at its default the process is killed in
/// the middle of writing, and the old file must still be there whole (setrlimit(2), signal(7); from memory).
/// </summary>
[Collection(CrashCollection.Name)]
[UnsupportedOSPlatform("windows")]
public sealed class FileSizeLimitTests : IDisposable
{
    private const int KilledBySigxfsz = 128 + 25;

    private readonly CrashFolder folder = new();

    public void Dispose() => folder.Dispose();

    [UnixFact]
    public void Over_the_file_size_limit_the_save_verb_fails_with_a_clear_message_and_keeps_the_file()
    {
        var before = CopyPlant();

        var (code, stdout, stderr) = SaveUnderLimit("trap '' XFSZ; ");

        Assert.Equal(2, code);
        Assert.Equal("", stdout);
        string plant = Regex.Escape(folder.Plant);
        Assert.Matches($"^{plant}: error: could not save {plant}: the new file \\(1[0-9]{{3}} bytes\\) is larger than the file-size limit \\(ulimit -f\\) or the file system allows; the file is unchanged\n$", stderr);
        Assert.Equal(before, File.ReadAllBytes(folder.Plant));
        Assert.Equal(["plant.toml"], Directory.GetFiles(folder.Library).Select(Path.GetFileName));
    }

    [UnixFact]
    public void Killed_by_SIGXFSZ_in_the_middle_of_the_write_the_save_verb_leaves_the_old_file_whole()
    {
        var before = CopyPlant();

        var (code, _, _) = SaveUnderLimit("");

        Assert.Equal(KilledBySigxfsz, code);
        Assert.Equal(before, File.ReadAllBytes(folder.Plant));
        var leftover = Assert.Single(Directory.GetFiles(folder.Library, ".plant.toml.*.tmp"));
        Assert.True(new FileInfo(leftover).Length < before.Length, "the temporary file was cut short by the limit");
        Assert.Equal(["plant.toml"], PlantLibrary.Scan(folder.Library).Select(e => e.FileName));
    }

    private byte[] CopyPlant()
    {
        File.Copy(RepoFiles.Plant("conveyor-speed.toml"), folder.Plant);
        return File.ReadAllBytes(folder.Plant);
    }

    private (int Code, string Out, string Err) SaveUnderLimit(string trap)
    {
        var start = new ProcessStartInfo("/bin/sh") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var argument in new[] { "-c", $"ulimit -f 1; {trap}exec \"$0\" \"$@\"", SaveVerbRun.Executable, "save", folder.Plant, "--set", "Kp=7" })
        {
            start.ArgumentList.Add(argument);
        }

        // The runtime's write-xor-execute double mapping sizes a memory file beyond any small limit; without it the
        // runtime would not even start.
        start.Environment["DOTNET_EnableWriteXorExecute"] = "0";
        using var shell = Process.Start(start)!;
        var stdout = shell.StandardOutput.ReadToEndAsync();
        string stderr = shell.StandardError.ReadToEnd();
        shell.WaitForExit();
        return (shell.ExitCode, stdout.Result, stderr);
    }
}
