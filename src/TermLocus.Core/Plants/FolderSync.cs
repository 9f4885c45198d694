using System.Runtime.InteropServices;

namespace TermLocus.Core.Plants;

/// <summary>
/// Flushes a folder's entries to disk (fsync on the folder), so that a rename that replaced a file survives a power
/// cut. .NET cannot open a folder as a file, hence the libc calls (source-generated, NativeAOT-safe).
/// </summary>
internal static partial class FolderSync
{
    private const int ReadOnlyFlag = 0; // O_RDONLY; a folder opened read-only can be fsync'ed on Linux and macOS.

    /// <summary>0 when <paramref name="folder"/> was flushed (or the platform needs no flush), else the errno.</summary>
    public static int Flush(string folder)
    {
        if (OperatingSystem.IsWindows())
        {
            return 0;
        }

        var descriptor = Open(folder, ReadOnlyFlag);
        if (descriptor < 0)
        {
            return Marshal.GetLastPInvokeError();
        }

        var error = Fsync(descriptor) == 0 ? 0 : Marshal.GetLastPInvokeError();
        _ = Close(descriptor);
        return error;
    }

    [LibraryImport("libc", EntryPoint = "open", StringMarshalling = StringMarshalling.Utf8, SetLastError = true)]
    private static partial int Open(string path, int flags);

    [LibraryImport("libc", EntryPoint = "fsync", SetLastError = true)]
    private static partial int Fsync(int descriptor);

    [LibraryImport("libc", EntryPoint = "close", SetLastError = true)]
    private static partial int Close(int descriptor);
}
