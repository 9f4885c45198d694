using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.App.Workbench;

/// <summary>The design half of the bridge.</summary>
internal static partial class CoreBridge
{
    /// <summary>
    /// The robust design over the plant's traced range, every other parameter nominal: the same function the
    /// <c>design</c> verb runs, overshoot limit included (a few ms to tens of ms for the demo plants, up to about
    /// 40 ms when step responses are simulated; right after start-up, before the code is compiled, several times
    /// that; so it runs off the UI thread).
    /// </summary>
    public static Designed Design(LoadedPlant loaded)
    {
        if (loaded.Model is not { } model)
        {
            return new Designed(loaded.Plant.Path, null, "this plant has no loop model to design with");
        }

        try
        {
            return new Designed(loaded.Plant.Path, RobustDesign.Find(model, loaded.Plant.NominalValues(), loaded.Range), null);
        }
        catch (Exception e) when (e is PlantFileException or ArgumentException or ArithmeticException or InvalidOperationException)
        {
            return new Designed(loaded.Plant.Path, null, e is PlantFileException p ? p.Error.Message : e.Message);
        }
    }
}
