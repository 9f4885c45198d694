using System.Globalization;
using System.Security.Cryptography;

namespace TermLocus.Core.Plants;

/// <summary>
/// Replaces a file's content so that a crash or power cut leaves either the old file or the new one, never a mix:
/// the new bytes go to a temporary file beside the target (same folder, same permission bits), are flushed to disk,
/// renamed over the target, and the folder is flushed. Symbolic links are followed (the link stays a link). The save
/// is refused when the file changed on disk since it was loaded (by SHA-256, which an mtime check cannot match),
/// when it is read-only, or when the folder is; an unchanged file is not rewritten. As with every rename-based save,
/// the file's owner becomes the writer and a hard link to it is split.
/// </summary>
public static class AtomicFileSaver
{
    private const UnixFileMode AnyWrite = UnixFileMode.UserWrite | UnixFileMode.GroupWrite | UnixFileMode.OtherWrite;

    /// <summary>
    /// Saves <paramref name="newBytes"/> to <paramref name="path"/> if the file still hashes to
    /// <paramref name="expectedSha256"/> (the SHA-256 of the bytes that were loaded). Never throws for I/O problems:
    /// the outcome says what happened.
    /// </summary>
    public static AtomicSaveResult TrySave(string path, ReadOnlySpan<byte> newBytes, ReadOnlySpan<byte> expectedSha256)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (!TryResolveTarget(path, out var target, out var failure))
        {
            return failure!;
        }

        byte[] currentHash;
        try
        {
            using var current = new FileStream(target, FileMode.Open, FileAccess.Read, FileShare.ReadWrite | FileShare.Delete);
            currentHash = SHA256.HashData(current);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return new(SaveOutcome.Failed, target, $"cannot read {path} to check it before saving: {PlantTextSafety.Visible(e.Message, 200)}");
        }

        if (!currentHash.AsSpan().SequenceEqual(expectedSha256))
        {
            return new(SaveOutcome.ChangedOnDisk, target, $"{path} changed on disk since it was loaded; reload it, or save under another name");
        }

        if (SHA256.HashData(newBytes).AsSpan().SequenceEqual(expectedSha256))
        {
            return new(SaveOutcome.Unchanged, target, $"{path} already holds these values; nothing written");
        }

        return WriteProblem(path, target) ?? Replace(path, target, newBytes, ModeOf(target));
    }

    /// <summary>Like <see cref="TrySave(string, ReadOnlySpan{byte}, ReadOnlySpan{byte})"/> for a loaded plant document.</summary>
    public static AtomicSaveResult TrySave(PlantDocument document, ReadOnlySpan<byte> newBytes)
    {
        ArgumentNullException.ThrowIfNull(document);
        return TrySave(document.Path, newBytes, document.Sha256.AsSpan());
    }

    /// <summary>Like <see cref="TrySave(string, ReadOnlySpan{byte}, ReadOnlySpan{byte})"/>, but throws when the file was not saved.</summary>
    /// <exception cref="AtomicSaveException">The save was refused or failed; the original file is untouched.</exception>
    public static AtomicSaveResult Save(string path, ReadOnlySpan<byte> newBytes, ReadOnlySpan<byte> expectedSha256)
    {
        var result = TrySave(path, newBytes, expectedSha256);
        return result.Succeeded ? result : throw new AtomicSaveException(result);
    }

    /// <summary>
    /// Writes <paramref name="bytes"/> to <paramref name="path"/> whether or not it exists (a recovery file, a save
    /// under another name), with the same atomic replacement but no changed-on-disk check. An existing file is replaced
    /// only when <paramref name="overwrite"/> is true (its permission bits kept); a new file gets the default mode.
    /// A folder without write permission bits is refused, as for <see cref="TrySave(string, ReadOnlySpan{byte}, ReadOnlySpan{byte})"/>.
    /// </summary>
    public static AtomicSaveResult TryWriteFile(string path, ReadOnlySpan<byte> bytes, bool overwrite) =>
        TryWriteFile(path, bytes, overwrite, null);

    /// <summary>
    /// Like <see cref="TryWriteFile(string, ReadOnlySpan{byte}, bool)"/>, but a file that does not exist yet gets the
    /// permission bits of <paramref name="permissionsOf"/> (the file its content was made from, so a private plant
    /// file does not leave a world-readable copy) instead of the default mode. Ignored on Windows, or when that file
    /// cannot be read for its mode.
    /// </summary>
    public static AtomicSaveResult TryWriteFile(string path, ReadOnlySpan<byte> bytes, bool overwrite, string? permissionsOf)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (!TryResolveTarget(path, out var target, out var failure))
        {
            if (failure!.Outcome != SaveOutcome.Missing)
            {
                return failure;
            }

            target = Path.GetFullPath(path);
            if (!Directory.Exists(Path.GetDirectoryName(target)))
            {
                return new(SaveOutcome.Failed, target, $"the folder of {path} does not exist");
            }

            return FolderProblem(path, target) ?? Replace(path, target, bytes, ModeOf(permissionsOf));
        }

        return !overwrite
            ? new(SaveOutcome.AlreadyExists, target, $"{path} exists already; choose another name")
            : WriteProblem(path, target) ?? Replace(path, target, bytes, ModeOf(target));
    }

    private static bool TryResolveTarget(string path, out string target, out AtomicSaveResult? failure)
    {
        target = path;
        failure = null;
        try
        {
            var info = new FileInfo(path);
            target = info.ResolveLinkTarget(returnFinalTarget: true)?.FullName ?? info.FullName;
            if (!File.Exists(target))
            {
                failure = new(SaveOutcome.Missing, target, $"{path} no longer exists; save under another name");
            }
        }
        catch (Exception e) when (e is FileNotFoundException or DirectoryNotFoundException)
        {
            failure = new(SaveOutcome.Missing, target, $"{path} no longer exists (or links to nothing); save under another name");
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException)
        {
            failure = new(SaveOutcome.Failed, target, $"cannot find the file behind {path}: {PlantTextSafety.Visible(e.Message, 200)}");
        }

        return failure is null;
    }

    private static AtomicSaveResult? WriteProblem(string path, string target)
    {
        var folder = Path.GetDirectoryName(target)!;
        if (OperatingSystem.IsWindows())
        {
            return File.GetAttributes(target).HasFlag(FileAttributes.ReadOnly)
                ? new(SaveOutcome.ReadOnlyFile, target, $"{path} is read-only; clear the read-only flag or save under another name")
                : null;
        }

        var mode = File.GetUnixFileMode(target);
        if ((mode & AnyWrite) == 0)
        {
            return new(SaveOutcome.ReadOnlyFile, target, $"{path} is read-only (mode {Convert.ToString((int)mode, 8)}); make it writable (chmod u+w) or save under another name");
        }

        if (FolderProblem(path, target) is { } problem)
        {
            return problem;
        }

        try
        {
            using var probe = new FileStream(target, FileMode.Open, FileAccess.Write, FileShare.ReadWrite | FileShare.Delete);
        }
        catch (UnauthorizedAccessException)
        {
            return new(SaveOutcome.ReadOnlyFile, target, $"you may not write {path}; ask its owner, or save under another name");
        }
        catch (IOException e)
        {
            return new(SaveOutcome.Failed, target, $"cannot open {path} for writing: {PlantTextSafety.Visible(e.Message, 200)}");
        }

        return null;
    }

    // Checked by mode bits, not by trying: root may write anywhere, but a folder marked read-only means "keep out".
    private static AtomicSaveResult? FolderProblem(string path, string target)
    {
        var folder = Path.GetDirectoryName(target)!;
        return OperatingSystem.IsWindows() || (File.GetUnixFileMode(folder) & AnyWrite) != 0
            ? null
            : new(SaveOutcome.ReadOnlyFolder, target, $"the folder {folder} is read-only, and saving writes a new copy beside {Path.GetFileName(target)}; make the folder writable or save elsewhere");
    }

    private static UnixFileMode? ModeOf(string? file)
    {
        if (file is null || OperatingSystem.IsWindows())
        {
            return null;
        }

        try
        {
            return File.GetUnixFileMode(file);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException)
        {
            return null;
        }
    }

    private static AtomicSaveResult Replace(string path, string target, ReadOnlySpan<byte> newBytes, UnixFileMode? mode)
    {
        var folder = Path.GetDirectoryName(target)!;
        var temp = Path.Combine(folder, $".{Path.GetFileName(target)}.{RandomNumberGenerator.GetHexString(12, lowercase: true)}.tmp");
        try
        {
            WriteTemporary(temp, newBytes, mode);
            File.Move(temp, target, overwrite: true);
        }
        catch (UnauthorizedAccessException) when (!File.Exists(temp))
        {
            return new(SaveOutcome.ReadOnlyFolder, target, $"cannot create a file in {folder}; make the folder writable or save elsewhere");
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            TryDelete(temp);
            return new(SaveOutcome.Failed, target, $"could not save {path}: {PlantTextSafety.Visible(e.Message, 200)}; the file is unchanged");
        }
        catch (ArgumentOutOfRangeException)
        {
            // .NET reports EFBIG (over the process's file-size limit, or the file system's largest file) this way.
            TryDelete(temp);
            return new(SaveOutcome.Failed, target, string.Create(CultureInfo.InvariantCulture, $"could not save {path}: the new file ({newBytes.Length} bytes) is larger than the file-size limit (ulimit -f) or the file system allows; the file is unchanged"));
        }

        var error = FolderSync.Flush(folder);
        return new(SaveOutcome.Saved, target, error == 0
            ? $"saved {path}"
            : string.Create(CultureInfo.InvariantCulture, $"saved {path} (the folder could not be flushed to disk, errno {error})"));
    }

    private static void WriteTemporary(string temp, ReadOnlySpan<byte> newBytes, UnixFileMode? mode)
    {
        using var stream = new FileStream(temp, FileMode.CreateNew, FileAccess.Write, FileShare.None);
        if (mode is { } bits && !OperatingSystem.IsWindows())
        {
            // The create mode is masked by the umask; set the wanted bits on the open handle, before any byte is written.
            File.SetUnixFileMode(stream.SafeFileHandle, bits);
        }

        stream.Write(newBytes);
        stream.Flush(flushToDisk: true);
    }

    private static void TryDelete(string temp)
    {
        try
        {
            File.Delete(temp);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // A stray temporary file is harmless and its name says what it is; the save error matters more.
        }
    }
}
