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
        LoadPlantEffect e => Load(e.Path),
        ScanLibraryEffect e => new LibraryScanned(e.Folder, CoreBridge.ScanLibrary(e.Folder)),
        TraceLocusEffect e => Trace(e),
        SaveOperatingPointEffect e => Save(e),
        SaveRecoveryEffect e => WriteRecovery(e),
        QuitEffect => null,
        _ => throw new ArgumentOutOfRangeException(nameof(effect), effect, "unknown effect"),
    };

    private static Message Load(string path)
    {
        try
        {
            return new PlantLoaded(CoreBridge.Load(path));
        }
        catch (PlantFileException e)
        {
            return new PlantLoadFailed(path, e.Error.ToString());
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException)
        {
            return new PlantLoadFailed(path, $"{path}: error: {e.Message}");
        }
    }

    private static Message Trace(TraceLocusEffect e)
    {
        try
        {
            return new LocusTraced(CoreBridge.Trace(e.Loaded, e.Key));
        }
        catch (Exception ex) when (ex is ArithmeticException or ArgumentException or InvalidOperationException or NotSupportedException)
        {
            return new LocusTraceFailed(e.Key, ex.Message);
        }
    }

    private Message Save(SaveOperatingPointEffect e)
    {
        try
        {
            var saved = CoreBridge.SaveOperatingPoint(e.Plant, e.Value, e.Verdict, saveContext, e.Plant.Path);
            return new OperatingPointSaved(saved, e.Value, e.QuitAfter);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException or PlantFileException or NotSupportedException)
        {
            return new OperatingPointSaveFailed(ex.Message);
        }
    }

    private Message? WriteRecovery(SaveRecoveryEffect e)
    {
        try
        {
            CoreBridge.SaveOperatingPoint(e.Plant, e.Value, e.Verdict, saveContext, SaveRecoveryEffect.RecoveryPathFor(e.Plant.Path));
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException or PlantFileException or NotSupportedException)
        {
            // On the way out there is nobody to tell but the log the terminal layer writes after restoring the screen.
            return new OperatingPointSaveFailed("recovery file not written: " + ex.Message);
        }

        return null;
    }
}
