using System.Collections.Immutable;
using System.Security.Cryptography;
using TermLocus.Core.Plants;

namespace TermLocus.App.Workbench;

/// <summary>The file side of the bridge: saving (into the plant file, under another name, again where it was),
/// comparing the file on disk with the bytes loaded, and the recovery file beside a plant.</summary>
internal static partial class CoreBridge
{
    /// <summary>
    /// Saves as <paramref name="save"/> asks (every write atomic, through <see cref="AtomicFileSaver"/>): the saved
    /// file read back, a refusal that needs the user's choice (changed on disk, gone, name taken), or a failure.
    /// </summary>
    /// <exception cref="IOException">The plant was not read from a file.</exception>
    /// <exception cref="PlantFileException">The value cannot be written into the file's text, or the file written
    /// does not read back.</exception>
    public static Message Save(SaveOperatingPointEffect save, SaveContext context)
    {
        var loaded = save.Loaded;
        var document = loaded.Document ?? throw new IOException("this plant was not read from a file");
        var bytes = SavedBytes(loaded, save.Value, save.Verdict, context, save.Name, save.Note);
        string target = save.Mode == SaveMode.NewFile ? save.TargetPath ?? document.Path : document.Path;
        var result = save.Mode switch
        {
            SaveMode.IntoPlantFile => AtomicFileSaver.TrySave(document, bytes),
            SaveMode.NewFile => AtomicFileSaver.TryWriteFile(target, bytes, overwrite: false, permissionsOf: document.Path),
            SaveMode.WriteAgain => WriteAgain(document, bytes),
            _ => throw new ArgumentOutOfRangeException(nameof(save), save.Mode, "unknown save mode"),
        };
        SaveRefusal? refusal = result.Outcome switch
        {
            SaveOutcome.ChangedOnDisk => SaveRefusal.FileChanged,
            SaveOutcome.Missing when save.Mode != SaveMode.NewFile => SaveRefusal.FileMissing,
            SaveOutcome.AlreadyExists when save.Mode == SaveMode.NewFile => SaveRefusal.TargetExists,
            _ => null,
        };
        if (refusal is { } reason)
        {
            return new SaveRefused(save, reason, result.Message, SuggestSaveAs(document.Path));
        }

        if (!result.Succeeded)
        {
            return new OperatingPointSaveFailed(result.Message);
        }

        var written = PlantFileReader.ReadDocument(target);
        return new OperatingPointSaved(written.Plant, written, save.Value, save.QuitAfter);
    }

    /// <summary>How the file at <paramref name="path"/> compares with bytes hashing to <paramref name="expectedSha256"/>.</summary>
    public static PlantFileChecked CheckFile(string path, ImmutableArray<byte> expectedSha256) =>
        new(path, expectedSha256, StateOnDisk(path, expectedSha256), SuggestSaveAs(path));

    /// <summary>A free <c>name.N.toml</c> beside <paramref name="plantPath"/>.</summary>
    public static string SuggestSaveAs(string plantPath) =>
        SaveAsNames.Suggest(plantPath, p => File.Exists(p) || Directory.Exists(p));

    /// <summary>
    /// Writes what saving would write to <c>&lt;plant&gt;.recovery</c> the same crash-safe way as a save (flushed, renamed
    /// into place; a new recovery file gets the plant file's permission bits); the plant file is not touched.
    /// </summary>
    /// <exception cref="IOException">The recovery file could not be written (the message says why).</exception>
    public static string WriteRecovery(LoadedPlant loaded, double value, string? verdict, SaveContext context)
    {
        var document = loaded.Document ?? throw new IOException("this plant was not read from a file");
        string name = SaveRecoveryEffect.RecordName(loaded.Plant.Loop.Sweep, value);
        var bytes = SavedBytes(loaded, value, verdict, context, name, SaveRecoveryEffect.RecordNote);
        string target = SaveRecoveryEffect.RecoveryPathFor(document.Path);
        var result = AtomicFileSaver.TryWriteFile(target, bytes, overwrite: true, permissionsOf: document.Path);
        return result.Succeeded ? target : throw new IOException(result.Message);
    }

    /// <summary>
    /// The recovery file beside the plant <paramref name="loaded"/> was read from, or null when there is none. A file
    /// that cannot be read, is not a plant file or sweeps another parameter comes back with its problem; never throws.
    /// </summary>
    public static RecoveryFile? FindRecovery(LoadedPlant loaded)
    {
        if (loaded.Document is not { } document)
        {
            return null;
        }

        string path = SaveRecoveryEffect.RecoveryPathFor(document.Path);
        try
        {
            if (!File.Exists(path))
            {
                return null;
            }

            var written = new DateTimeOffset(File.GetLastWriteTimeUtc(path), TimeSpan.Zero);
            var plantChanged = new DateTimeOffset(File.GetLastWriteTimeUtc(document.Path), TimeSpan.Zero);
            return ReadRecovery(path, loaded.Plant.Loop.Sweep) with { WrittenUtc = written, PlantChangedUtc = plantChanged };
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return new RecoveryFile(path, DateTimeOffset.MinValue, DateTimeOffset.MinValue, null, null, "it cannot be read: " + e.Message);
        }
    }

    /// <summary>Deletes the recovery file <paramref name="path"/> (only a file named <c>*.recovery</c>).</summary>
    public static RecoveryDeleted DeleteRecovery(string path)
    {
        if (!path.EndsWith(".recovery", StringComparison.Ordinal))
        {
            return new RecoveryDeleted(path, "not a recovery file");
        }

        try
        {
            File.Delete(path);
            return new RecoveryDeleted(path, null);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return new RecoveryDeleted(path, e.Message);
        }
    }

    private static RecoveryFile ReadRecovery(string path, string swept)
    {
        var none = new RecoveryFile(path, default, default, null, null, null);
        try
        {
            var recovered = PlantFileReader.ReadDocument(path).Plant;
            return recovered.Loop.Sweep == swept
                ? none with { Parameter = swept, Value = recovered.SweptParameter.Value }
                : none with { Parameter = recovered.Loop.Sweep, Problem = $"it holds a value for {recovered.Loop.Sweep}, but the plant now sweeps {swept}" };
        }
        catch (PlantFileException e)
        {
            return none with { Problem = "it is not a readable plant file: " + (e.Error with { File = Path.GetFileName(path) }) };
        }
    }

    // The file came back (restored, or written by someone): save into it only if it holds the bytes loaded.
    private static AtomicSaveResult WriteAgain(PlantDocument document, byte[] bytes)
    {
        var result = AtomicFileSaver.TryWriteFile(document.Path, bytes, overwrite: false);
        return result.Outcome == SaveOutcome.AlreadyExists ? AtomicFileSaver.TrySave(document, bytes) : result;
    }

    private static FileOnDisk StateOnDisk(string path, ImmutableArray<byte> expectedSha256)
    {
        try
        {
            using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.ReadWrite | FileShare.Delete);
            return SHA256.HashData(stream).AsSpan().SequenceEqual(expectedSha256.AsSpan()) ? FileOnDisk.AsLoaded : FileOnDisk.Changed;
        }
        catch (Exception e) when (e is FileNotFoundException or DirectoryNotFoundException)
        {
            return FileOnDisk.Missing;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // Unreadable now (permissions changed, or a folder in its place): it cannot be the file loaded.
            return FileOnDisk.Changed;
        }
    }
}
