using TermLocus.Core.Plants;

namespace TermLocus.App.Workbench;

/// <summary>
/// Performs one effect and says what came of it as a message. Blocking: the terminal layer runs it off the UI thread
/// and posts the message back; tests run it in line. Expected failures become failure messages, never exceptions.
/// </summary>
public sealed class EffectWorker(SaveContext saveContext)
{
    /// <summary>The outcome of <paramref name="effect"/>, or null when it has none (quitting, the recovery file).</summary>
    public Message? Perform(Effect effect) => effect switch
    {
        LoadPlantEffect e => Load(e.Path, e.Keep),
        ScanLibraryEffect e => Scan(e.Folder),
        TraceLocusEffect e => Trace(e),
        DesignEffect e => CoreBridge.Design(e.Loaded),
        CheckBandEffect e => CoreBridge.CheckBand(e.Loaded, e.SweptValue),
        SimulateResponseEffect e => CoreBridge.Simulate(e.Loaded, e.Values, e.Key),
        SaveOperatingPointEffect e => Save(e),
        SaveRecoveryEffect e => WriteRecovery(e),
        CheckPlantFileEffect e => CoreBridge.CheckFile(e.Path, e.ExpectedSha256),
        DeleteRecoveryEffect e => CoreBridge.DeleteRecovery(e.Path),
        QuitEffect => null,
        _ => throw new ArgumentOutOfRangeException(nameof(effect), effect, "unknown effect"),
    };

    private static Message Load(string path, KeptValue? keep)
    {
        try
        {
            var loaded = CoreBridge.Load(path);
            // A reload keeps the user's value; a recovery file is offered only when a plant is opened.
            return new PlantLoaded(loaded) { Kept = keep, Recovery = keep is null ? CoreBridge.FindRecovery(loaded) : null };
        }
        catch (PlantFileException e)
        {
            return new PlantLoadFailed(path, e.Error.ToString());
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException)
        {
            return new PlantLoadFailed(path, $"{path}: error: {e.Message}");
        }
    }

    private static Message Scan(string folder)
    {
        try
        {
            return new LibraryScanned(folder, CoreBridge.ScanLibrary(folder));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return new LibraryScanned(folder, [], $"cannot read the library folder {folder}: {e.Message}");
        }
    }

    private static Message Trace(TraceLocusEffect e)
    {
        try
        {
            return new LocusTraced(CoreBridge.Trace(e.Loaded, e.Key, e.Family));
        }
        catch (Exception ex) when (ex is ArithmeticException or ArgumentException or InvalidOperationException or PlantFileException)
        {
            return new LocusTraceFailed(e.Key, ex.Message);
        }
    }

    private Message Save(SaveOperatingPointEffect e)
    {
        try
        {
            return CoreBridge.Save(e, saveContext);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException or ArgumentException)
        {
            return new OperatingPointSaveFailed(ex.Message);
        }
        catch (PlantFileException ex)
        {
            return new OperatingPointSaveFailed(ex.Error.ToString());
        }
    }

    private Message? WriteRecovery(SaveRecoveryEffect e)
    {
        try
        {
            CoreBridge.WriteRecovery(e.Loaded, e.Value, e.Verdict, saveContext);
            return null;
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException or ArgumentException or PlantFileException)
        {
            // On the way out there is nobody to tell but the report printed after the terminal is restored.
            return new OperatingPointSaveFailed("recovery file not written: " + ex.Message);
        }
    }
}
