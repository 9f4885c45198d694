using TermLocus.Core.Plants;

namespace TermLocus.App.Workbench;

/// <summary>The swept parameter as the user is stepping it.</summary>
/// <param name="Name">The parameter's name (an identifier, safe to print).</param>
/// <param name="Unit">Its unit from the file (untrusted), empty when absent.</param>
/// <param name="Value">The value being looked at.</param>
/// <param name="SavedValue">The value in the plant file; the value is unsaved while it differs.</param>
/// <param name="Step">Step of the arrow keys, &gt; 0, on the 1-2-5 series.</param>
/// <param name="Range">The span the locus is traced over.</param>
public sealed record SweepState(string Name, string Unit, double Value, double SavedValue, double Step, Interval Range)
{
    /// <summary>True when the value differs from the one in the file.</summary>
    public bool Unsaved => Value != SavedValue;

    /// <summary>Where the value stands in the range, 0 at the start and 1 at the end (clamped).</summary>
    public double Position => Range.Width > 0 ? Math.Clamp((Value - Range.Low) / Range.Width, 0, 1) : 0;
}
