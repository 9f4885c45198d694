using System.Collections.Immutable;
using System.Security.Cryptography;
using System.Text;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Plants;

/// <summary>
/// The saver in a real temporary folder. Expected behaviour follows POSIX rename(2) and fsync(2) semantics
/// (common practice for atomic replacement) and the verified notes in tomlyn-2.10.md "Saving safely".
/// </summary>
public sealed class AtomicFileSaverTests : IDisposable
{
    private static readonly byte[] OldBytes = Encoding.UTF8.GetBytes("old = 1\n");
    private static readonly byte[] NewBytes = Encoding.UTF8.GetBytes("new = 2\n");
    private static readonly byte[] OldHash = SHA256.HashData(OldBytes);

    private readonly TemporaryFolder folder = new();

    public void Dispose() => folder.Dispose();

    private string Original(string name = "plant.toml")
    {
        var path = folder.File(name);
        File.WriteAllBytes(path, OldBytes);
        return path;
    }

    [Fact]
    public void Saving_replaces_the_content_and_leaves_no_temporary_file()
    {
        var path = Original();

        var result = AtomicFileSaver.TrySave(path, NewBytes, OldHash);

        Assert.Equal(SaveOutcome.Saved, result.Outcome);
        Assert.Equal($"saved {path}", result.Message); // no errno: the folder flush through libc worked
        Assert.True(result.Succeeded);
        Assert.Equal(NewBytes, File.ReadAllBytes(path));
        Assert.Equal(["plant.toml"], Directory.GetFiles(folder.Path).Select(Path.GetFileName));
    }

    [Fact]
    public void Saving_keeps_the_permission_bits_despite_the_umask()
    {
        if (OperatingSystem.IsWindows())
        {
            return;
        }

        var path = Original();
        const UnixFileMode mode = UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.GroupRead | UnixFileMode.GroupWrite | UnixFileMode.OtherRead;
        File.SetUnixFileMode(path, mode);

        AtomicFileSaver.Save(path, NewBytes, OldHash);

        Assert.Equal(mode, File.GetUnixFileMode(path));
    }

    [Fact]
    public void A_symbolic_link_is_followed_and_stays_a_link()
    {
        var target = Original("real.toml");
        var link = folder.File("link.toml");
        File.CreateSymbolicLink(link, target);

        var result = AtomicFileSaver.TrySave(link, NewBytes, OldHash);

        Assert.Equal(SaveOutcome.Saved, result.Outcome);
        Assert.Equal(target, result.TargetPath);
        Assert.NotNull(new FileInfo(link).LinkTarget);
        Assert.Equal(NewBytes, File.ReadAllBytes(target));
    }

    [Fact]
    public void A_file_changed_on_disk_since_loading_is_not_overwritten()
    {
        var path = Original();
        var edited = Encoding.UTF8.GetBytes("old = 9\n"); // same size: an mtime-and-size check could be fooled
        File.WriteAllBytes(path, edited);

        var result = AtomicFileSaver.TrySave(path, NewBytes, OldHash);

        Assert.Equal(SaveOutcome.ChangedOnDisk, result.Outcome);
        Assert.Contains("changed on disk since it was loaded", result.Message, StringComparison.Ordinal);
        Assert.Equal(edited, File.ReadAllBytes(path));
        Assert.Throws<AtomicSaveException>(() => AtomicFileSaver.Save(path, NewBytes, OldHash));
    }

    [Fact]
    public void A_read_only_file_is_refused_with_a_clear_message()
    {
        if (OperatingSystem.IsWindows())
        {
            return;
        }

        var path = Original();
        File.SetUnixFileMode(path, UnixFileMode.UserRead | UnixFileMode.GroupRead | UnixFileMode.OtherRead);

        var result = AtomicFileSaver.TrySave(path, NewBytes, OldHash);

        Assert.Equal(SaveOutcome.ReadOnlyFile, result.Outcome);
        Assert.Equal($"{path} is read-only (mode 444); make it writable (chmod u+w) or save under another name", result.Message);
        Assert.Equal(OldBytes, File.ReadAllBytes(path));
    }

    [Fact]
    public void A_read_only_folder_is_refused_with_a_clear_message()
    {
        if (OperatingSystem.IsWindows())
        {
            return;
        }

        var path = Original();
        File.SetUnixFileMode(folder.Path, UnixFileMode.UserRead | UnixFileMode.UserExecute);

        var result = AtomicFileSaver.TrySave(path, NewBytes, OldHash);

        Assert.Equal(SaveOutcome.ReadOnlyFolder, result.Outcome);
        Assert.StartsWith($"the folder {folder.Path} is read-only", result.Message, StringComparison.Ordinal);
        Assert.Equal(OldBytes, File.ReadAllBytes(path));
    }

    [Fact]
    public void Unchanged_bytes_are_not_written()
    {
        var path = Original();
        var stamp = new DateTime(2001, 2, 3, 4, 5, 6, DateTimeKind.Utc);
        File.SetLastWriteTimeUtc(path, stamp);

        var result = AtomicFileSaver.TrySave(path, OldBytes, OldHash);

        Assert.Equal(SaveOutcome.Unchanged, result.Outcome);
        Assert.True(result.Succeeded);
        Assert.Equal(stamp, File.GetLastWriteTimeUtc(path));
    }

    [Fact]
    public void A_deleted_file_or_dangling_link_is_reported_missing()
    {
        var path = Original();
        var link = folder.File("dangling.toml");
        File.CreateSymbolicLink(link, folder.File("gone.toml"));
        File.Delete(path);

        Assert.Equal(SaveOutcome.Missing, AtomicFileSaver.TrySave(path, NewBytes, OldHash).Outcome);
        Assert.Equal(SaveOutcome.Missing, AtomicFileSaver.TrySave(link, NewBytes, OldHash).Outcome);
        Assert.False(File.Exists(path));
    }

    [Fact]
    public void Loading_saving_and_reloading_a_plant_keeps_every_untouched_byte()
    {
        var path = folder.File("rig.toml");
        const string text = "# keep me\r\n[parameters]\r\nK = { value = 1, range = [0, 5] }  # gain\r\n[loop]\r\nplant = \"K/s\"\r\nsweep = \"K\"";
        File.WriteAllBytes(path, [.. Encoding.UTF8.Preamble, .. Encoding.UTF8.GetBytes(text)]);
        var document = PlantFileReader.ReadDocument(path);
        var record = new OperatingPointRecord("tune", DateTimeOffset.UnixEpoch, "me@here", ImmutableArray<KeyValuePair<string, double>>.Empty, "ok", "");

        var result = AtomicFileSaver.TrySave(document, OperatingPointWriter.Apply(document, 2.5, record));

        Assert.Equal(SaveOutcome.Saved, result.Outcome);
        var reloaded = PlantFileReader.ReadDocument(path);
        Assert.Equal(2.5, reloaded.Plant.SweptParameter.Value, 0);
        Assert.True(reloaded.HasBom);
        Assert.StartsWith(text.Replace("value = 1,", "value = 2.5,", StringComparison.Ordinal), reloaded.Text, StringComparison.Ordinal);
        Assert.Equal(SaveOutcome.ChangedOnDisk, AtomicFileSaver.TrySave(document, OperatingPointWriter.Apply(document, 3, record)).Outcome);
    }

    [Fact]
    public void Writing_a_new_file_creates_it_and_refuses_to_replace_unless_asked()
    {
        var path = folder.File("plant.toml.recovery");

        Assert.Equal(SaveOutcome.Saved, AtomicFileSaver.TryWriteFile(path, OldBytes, overwrite: false).Outcome);
        Assert.Equal(SaveOutcome.AlreadyExists, AtomicFileSaver.TryWriteFile(path, NewBytes, overwrite: false).Outcome);
        Assert.Equal(OldBytes, File.ReadAllBytes(path));
        Assert.Equal(SaveOutcome.Saved, AtomicFileSaver.TryWriteFile(path, NewBytes, overwrite: true).Outcome);
        Assert.Equal(NewBytes, File.ReadAllBytes(path));
        Assert.Equal(SaveOutcome.Failed, AtomicFileSaver.TryWriteFile(folder.File("no/such/folder.toml"), NewBytes, overwrite: true).Outcome);
    }
    [Fact]
    public void A_new_file_can_take_the_permission_bits_of_the_file_it_was_made_from()
    {
        if (OperatingSystem.IsWindows())
        {
            return;
        }

        var plant = Original();
        const UnixFileMode mode = UnixFileMode.UserRead | UnixFileMode.UserWrite; // private: a copy must not be readable by more people
        File.SetUnixFileMode(plant, mode);
        var recovery = folder.File("plant.toml.recovery");

        var result = AtomicFileSaver.TryWriteFile(recovery, NewBytes, overwrite: true, permissionsOf: plant);

        Assert.Equal(SaveOutcome.Saved, result.Outcome);
        Assert.Equal(mode, File.GetUnixFileMode(recovery));
        Assert.Equal(NewBytes, File.ReadAllBytes(recovery));
        // An existing file keeps its own bits, whatever the model's.
        File.SetUnixFileMode(recovery, mode | UnixFileMode.GroupRead);
        Assert.Equal(SaveOutcome.Saved, AtomicFileSaver.TryWriteFile(recovery, OldBytes, overwrite: true, permissionsOf: plant).Outcome);
        Assert.Equal(mode | UnixFileMode.GroupRead, File.GetUnixFileMode(recovery));
    }

    [Fact]
    public void A_new_file_in_a_folder_marked_read_only_is_refused_even_for_root()
    {
        if (OperatingSystem.IsWindows())
        {
            return;
        }

        File.SetUnixFileMode(folder.Path, UnixFileMode.UserRead | UnixFileMode.UserExecute);

        var result = AtomicFileSaver.TryWriteFile(folder.File("plant.toml.recovery"), NewBytes, overwrite: true);

        Assert.Equal(SaveOutcome.ReadOnlyFolder, result.Outcome);
        Assert.StartsWith($"the folder {folder.Path} is read-only", result.Message, StringComparison.Ordinal);
        Assert.Empty(Directory.GetFiles(folder.Path));
    }
}
