using System.Collections.Immutable;

namespace TermLocus.Core.Plants;

/// <summary>
/// One plant file, loaded and validated: its parameters, loop definition, specs and saved operating points.
/// Immutable. Expressions are kept as text with their source position; LoopModel turns them into polynomials.
/// </summary>
/// <param name="Path">The file the plant was read from, as given by the caller.</param>
/// <param name="Title">The <c>title</c> key, untrusted text (sanitise before printing).</param>
/// <param name="Note">The <c>note</c> key, untrusted text; empty when absent.</param>
/// <param name="Parameters">The <c>[parameters]</c> table in file order.</param>
/// <param name="Loop">The <c>[loop]</c> table.</param>
/// <param name="Specs">The <c>[specs]</c> table (every limit optional).</param>
/// <param name="OperatingPoints">The <c>[[operating_points]]</c> records in file order.</param>
public sealed record Plant(
    string Path,
    string Title,
    string Note,
    ImmutableArray<Parameter> Parameters,
    LoopDefinition Loop,
    Specs Specs,
    ImmutableArray<OperatingPoint> OperatingPoints)
{
    /// <summary>The parameter called <paramref name="name"/>, or null.</summary>
    public Parameter? FindParameter(string name)
    {
        foreach (var p in Parameters)
        {
            if (p.Name == name)
            {
                return p;
            }
        }

        return null;
    }

    /// <summary>The swept parameter (validated to exist at load time).</summary>
    public Parameter SweptParameter => FindParameter(Loop.Sweep)
        ?? throw new InvalidOperationException($"Swept parameter '{Loop.Sweep}' is not defined.");

    /// <summary>
    /// The span the locus is traced over: the swept parameter's <see cref="Parameter.Range"/>, or, when the file gives
    /// none, from 0 to twice its nominal value ([2·value, 0] for a negative value, [0, 1] for zero).
    /// </summary>
    public Interval SweepRange
    {
        get
        {
            var swept = SweptParameter;
            return swept.Range ?? swept.Value switch
            {
                > 0 => new Interval(0, 2 * swept.Value),
                < 0 => new Interval(2 * swept.Value, 0),
                _ => new Interval(0, 1),
            };
        }
    }

    /// <summary>Every parameter's nominal <see cref="Parameter.Value"/>, by name.</summary>
    public ImmutableDictionary<string, double> NominalValues() =>
        Parameters.ToImmutableDictionary(p => p.Name, p => p.Value, StringComparer.Ordinal);

    /// <summary>The toleranced parameters (those with a band), in file order.</summary>
    public ImmutableArray<Parameter> TolerancedParameters() => Parameters.Where(p => p.Band is not null).ToImmutableArray();
}
