namespace TermLocus.Core.Analysis;

/// <summary>The number of parameter values a trace may still sample, shared by its pieces.</summary>
internal sealed class TraceBudget(int total)
{
    internal int Total { get; } = total;

    internal int Remaining { get; private set; } = total;

    internal int Used => Total - Remaining;

    /// <summary>Takes one value from the budget; false when none is left.</summary>
    internal bool TryTake()
    {
        if (Remaining <= 0)
        {
            return false;
        }

        Remaining--;
        return true;
    }
}
