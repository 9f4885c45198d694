using System.Security.Cryptography;
using TermLocus.Core.Plants;

namespace TermLocus.CrashDriver;

/// <summary>
/// Replaces TARGET with v0.bin, v1.bin, ... of VERSIONS_FOLDER in turn (save K writes version K mod count) through the
/// saver the workbench and the save verb use. The bytes are made by the test with OperatingPointWriter, so the loop
/// spends its time in the saver's write, flush and rename, where a kill matters.
/// </summary>
internal static class ReplaceLoop
{
    public static int Run(string target, string versionsFolder, long first, bool inPlace)
    {
        var versions = Directory.GetFiles(versionsFolder, "v*.bin").Order(StringComparer.Ordinal).Select(File.ReadAllBytes).ToArray();
        var hash = SHA256.HashData(File.ReadAllBytes(target)); // what loading the file would have remembered
        Markers.Ready();
        for (long k = first; k < first + SafetyStop.MaxSaves; k++)
        {
            var bytes = versions[k % versions.Length];
            Markers.Begin(k);
            if (inPlace)
            {
                File.WriteAllBytes(target, bytes);
            }
            else if (AtomicFileSaver.TrySave(target, bytes, hash) is { Outcome: not SaveOutcome.Saved } result)
            {
                Console.Error.WriteLine(result.Message);
                return 3;
            }

            hash = SHA256.HashData(bytes);
            Markers.Done(k);
        }

        return 0;
    }
}
