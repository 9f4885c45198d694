using System.Globalization;
using System.Security.Cryptography;

namespace TermLocus.Tests.Crash;

/// <summary>Names file content in a problem message without printing it: its size and a short hash.</summary>
internal static class ContentFingerprint
{
    /// <summary>"1234 bytes, SHA-256 0123456789AB".</summary>
    public static string Of(byte[] content) =>
        string.Create(CultureInfo.InvariantCulture, $"{content.Length} bytes, SHA-256 {Convert.ToHexString(SHA256.HashData(content))[..12]}");
}
