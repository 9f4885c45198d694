using System.Runtime.Versioning;
using TermLocus.App.Workbench;

namespace TermLocus.CrashDriver;

/// <summary>
/// Writes PLANT's recovery file over and over the way the workbench does on SIGHUP, SIGTERM or a crash: the
/// SaveRecoveryEffect performed by the EffectWorker (which WorkbenchApp's signal handler calls), write K following
/// <see cref="RecoverySchedule"/>. In place, the same bytes (made by the real effect in a scratch copy before the
/// loop starts) are written over the recovery file by truncating and rewriting it.
/// </summary>
[UnsupportedOSPlatform("windows")]
internal static class RecoveryLoop
{
    public static int Run(string plant, long first, bool inPlace)
    {
        long k = first;
        var worker = new EffectWorker(new SaveContext(() => RecoverySchedule.SavedAt(k), RecoverySchedule.By));
        string source = inPlace ? ScratchCopy(plant) : plant;
        if (worker.Perform(new LoadPlantEffect(source)) is not PlantLoaded { Loaded: var loaded })
        {
            Console.Error.WriteLine($"cannot load {source}");
            return 3;
        }

        var inPlaceVersions = inPlace ? Enumerable.Range(0, RecoverySchedule.Versions).Select(j => WriteScratch(worker, loaded, k = j)).ToArray() : [];
        k = first;
        Markers.Ready();
        for (; k < first + SafetyStop.MaxSaves; k++)
        {
            Markers.Begin(k);
            if (inPlace)
            {
                WriteInPlace(SaveRecoveryEffect.RecoveryPathFor(plant), inPlaceVersions[k % inPlaceVersions.Length], File.GetUnixFileMode(plant));
            }
            else if (worker.Perform(new SaveRecoveryEffect(loaded, RecoverySchedule.Value(k), RecoverySchedule.Verdict(k))) is OperatingPointSaveFailed failed)
            {
                Console.Error.WriteLine(failed.Problem);
                return 3;
            }

            Markers.Done(k);
        }

        return 0;
    }

    private static byte[] WriteScratch(EffectWorker worker, LoadedPlant loaded, long index)
    {
        worker.Perform(new SaveRecoveryEffect(loaded, RecoverySchedule.Value(index), RecoverySchedule.Verdict(index)));
        return File.ReadAllBytes(SaveRecoveryEffect.RecoveryPathFor(loaded.Document!.Path));
    }

    // Truncates and rewrites the one file (keeping the plant's permission bits, so only the tearing shows).
    private static void WriteInPlace(string path, byte[] bytes, UnixFileMode mode)
    {
        using var stream = new FileStream(path, new FileStreamOptions { Mode = FileMode.Create, Access = FileAccess.Write, UnixCreateMode = mode });
        stream.Write(bytes);
    }

    private static string ScratchCopy(string plant)
    {
        string folder = Path.Combine(Path.GetDirectoryName(Path.GetDirectoryName(Path.GetFullPath(plant)))!, "scratch");
        Directory.CreateDirectory(folder);
        string copy = Path.Combine(folder, Path.GetFileName(plant));
        File.Copy(plant, copy, overwrite: true);
        return copy;
    }
}
