using TermLocus.Core.Plants;

namespace TermLocus.Core.Analysis;

/// <summary>One toleranced parameter: its name, nominal value and band (Low &lt;= Nominal &lt;= High).</summary>
/// <param name="Name">Parameter name.</param>
/// <param name="Nominal">The parameter's value in the file (or as overridden).</param>
/// <param name="Band">The tolerance band, in the parameter's own unit.</param>
public sealed record ToleranceAxis(string Name, double Nominal, Interval Band)
{
    /// <summary>
    /// Offset of <paramref name="value"/> from nominal in percent of the nominal value, for labels such as "B -25 %";
    /// null when the nominal value is 0.
    /// </summary>
    public double? PercentFromNominal(double value) => Nominal == 0.0 ? null : 100.0 * (value - Nominal) / Math.Abs(Nominal);
}
