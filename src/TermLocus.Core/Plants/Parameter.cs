namespace TermLocus.Core.Plants;

/// <summary>One entry of <c>[parameters]</c>.</summary>
/// <param name="Name">Identifier used in expressions (<c>[A-Za-z_][A-Za-z0-9_]*</c>, never <c>s</c> or <c>pi</c>).</param>
/// <param name="Value">Nominal value, finite.</param>
/// <param name="Range">Span of the locus when this parameter is swept (Low &lt; High), or null.</param>
/// <param name="Band">Tolerance band (Low &lt;= Value &lt;= High), from <c>band</c> or <c>tolerance_pct</c>; null when not toleranced.</param>
/// <param name="Unit">Display unit, untrusted text, empty when absent; never converted.</param>
/// <param name="Note">Free text, untrusted, empty when absent.</param>
/// <param name="Location">Where the parameter's key stands in the file.</param>
public sealed record Parameter(
    string Name,
    double Value,
    Interval? Range,
    Interval? Band,
    string Unit,
    string Note,
    SourcePosition Location);
