namespace TermLocus.Core.Analysis;

/// <summary>
/// Turns feasibility samples along a span into the intervals where the function is feasible: each change of
/// feasibility between two neighbouring samples is an interval end, solved by the caller's crossing solver.
/// </summary>
internal static class FeasibleRuns
{
    /// <summary>
    /// The intervals of [<paramref name="from"/>, <paramref name="to"/>] where the samples are feasible, ascending.
    /// <paramref name="feasible"/>[i] (at least one) says whether sample i, in ascending order from
    /// <paramref name="from"/> to <paramref name="to"/>, is feasible; <paramref name="crossingBefore"/>(i) solves the
    /// change of feasibility between samples i − 1 and i. A feasible first or last sample opens or closes its interval
    /// at the span's end.
    /// </summary>
    public static List<(double From, double To)> Collect(
        IReadOnlyList<bool> feasible, double from, double to, Func<int, double> crossingBefore)
    {
        var result = new List<(double, double)>();
        double? start = feasible[0] ? from : null;
        for (int i = 1; i < feasible.Count; i++)
        {
            if (feasible[i] == feasible[i - 1])
            {
                continue;
            }

            double edge = crossingBefore(i);
            if (feasible[i])
            {
                start = edge;
            }
            else if (start is { } s)
            {
                result.Add((s, edge));
                start = null;
            }
        }

        if (start is { } open)
        {
            result.Add((open, to));
        }

        return result;
    }
}
