namespace TermLocus.Core.Analysis;

/// <summary>
/// The margins at one swept value, each the smallest over the points of the band checked (nominal and corners).
/// </summary>
/// <param name="Formed">False when the loop could not be formed or solved at some point (then nothing else counts).</param>
/// <param name="Stable">True when every finite pole at every point is strictly stable and no pole is at infinity.</param>
/// <param name="SlowestDecayRate">The smallest decay rate σ = −Re s over all poles and points, 1/s (+∞ with no poles).</param>
/// <param name="Relative">Per limit, in the order of <see cref="SpecCheck.Limits"/>: the smallest relative margin.</param>
internal sealed record DesignMarginsAt(bool Formed, bool Stable, double SlowestDecayRate, double[] Relative)
{
    /// <summary>Margins of a value where the loop cannot be formed: infeasible.</summary>
    public static DesignMarginsAt Unformed(int limits) =>
        new(false, false, double.NegativeInfinity, Enumerable.Repeat(double.NegativeInfinity, limits).ToArray());

    /// <summary>
    /// The design objective: the smallest relative spec margin, or the slowest decay rate (1/s) when the file sets
    /// no pole limits. Meaningful only where <see cref="Stable"/>.
    /// </summary>
    public double Smallest => Relative.Length == 0 ? SlowestDecayRate : Relative.Min();

    /// <summary>&gt;= 0 exactly when every limit holds and the loop is stable at every point; −1 when unstable.</summary>
    public double Feasibility => Formed && Stable ? Smallest : -1.0;
}
