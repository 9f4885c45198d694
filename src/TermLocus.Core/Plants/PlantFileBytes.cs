using System.Buffers;
using System.Globalization;
using System.Text.Unicode;

namespace TermLocus.Core.Plants;

/// <summary>
/// Reads a plant file's bytes with a size limit and turns them into text: strict UTF-8, an optional UTF-8 BOM,
/// no NUL characters. Every failure is a <see cref="PlantFileException"/> with the position of the bad byte.
/// </summary>
internal static class PlantFileBytes
{
    /// <summary>The largest plant file read, in bytes (1 MiB); a real plant file is a few kilobytes.</summary>
    public const int MaxBytes = 1 << 20;

    private static readonly byte[] Utf8Bom = [0xEF, 0xBB, 0xBF];

    /// <summary>Reads at most <see cref="MaxBytes"/> bytes of <paramref name="path"/>; larger files are refused.</summary>
    public static byte[] ReadBounded(string path)
    {
        try
        {
            using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.ReadWrite | FileShare.Delete, 1);
            if (stream.CanSeek && stream.Length > MaxBytes)
            {
                throw TooLarge(path, stream.Length);
            }

            return ReadAtMost(stream, path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException or ArgumentException)
        {
            throw new PlantFileException(new PlantFileError(path, new SourcePosition(1, 1), DescribeOpenFailure(path, e)));
        }
    }

    /// <summary>Decodes <paramref name="bytes"/> as strict UTF-8, dropping and reporting a leading BOM.</summary>
    public static (string Text, bool HasBom) Decode(ReadOnlySpan<byte> bytes, string path)
    {
        var hasBom = bytes.StartsWith(Utf8Bom);
        var body = hasBom ? bytes[Utf8Bom.Length..] : bytes;
        if (body.StartsWith((ReadOnlySpan<byte>)[0xFF, 0xFE]) || body.StartsWith((ReadOnlySpan<byte>)[0xFE, 0xFF]))
        {
            throw Fail(path, new SourcePosition(1, 1), "the file is UTF-16; save it as UTF-8");
        }

        var chars = ArrayPool<char>.Shared.Rent(Math.Max(body.Length, 1));
        try
        {
            var status = Utf8.ToUtf16(body, chars, out var read, out var written, replaceInvalidSequences: false);
            var text = new string(chars, 0, written);
            if (status != OperationStatus.Done)
            {
                var where = new SourceMap(text).PositionAt(text.Length);
                var badByte = read < body.Length ? body[read] : body[^1];
                throw Fail(path, where, string.Create(CultureInfo.InvariantCulture, $"invalid UTF-8 (byte 0x{badByte:X2}); the file must be UTF-8"));
            }

            var nul = text.IndexOf('\0', StringComparison.Ordinal);
            if (nul >= 0)
            {
                throw Fail(path, new SourceMap(text).PositionAt(nul), "NUL character (U+0000) in the file");
            }

            return (text, hasBom);
        }
        finally
        {
            ArrayPool<char>.Shared.Return(chars);
        }
    }

    private static byte[] ReadAtMost(Stream stream, string path)
    {
        using var buffer = new MemoryStream();
        var chunk = new byte[16 * 1024];
        int n;
        while ((n = stream.Read(chunk, 0, chunk.Length)) > 0)
        {
            buffer.Write(chunk, 0, n);
            if (buffer.Length > MaxBytes)
            {
                throw TooLarge(path, null);
            }
        }

        return buffer.ToArray();
    }

    private static PlantFileException TooLarge(string path, long? knownLength)
    {
        var size = knownLength is { } n ? n.ToString(CultureInfo.InvariantCulture) + " bytes" : "more than " + MaxBytes.ToString(CultureInfo.InvariantCulture) + " bytes";
        return Fail(path, new SourcePosition(1, 1), string.Create(
            CultureInfo.InvariantCulture, $"the file is too large ({size}; a plant file may have at most {MaxBytes} bytes)"));
    }

    private static string DescribeOpenFailure(string path, Exception e) => e switch
    {
        _ when Directory.Exists(path) => "this is a folder, not a plant file",
        FileNotFoundException or DirectoryNotFoundException => "no such file",
        UnauthorizedAccessException => "permission denied: cannot read the file",
        _ => "cannot read the file: " + PlantTextSafety.Visible(e.Message),
    };

    private static PlantFileException Fail(string path, SourcePosition where, string message) =>
        new(new PlantFileError(path, where, message));
}
