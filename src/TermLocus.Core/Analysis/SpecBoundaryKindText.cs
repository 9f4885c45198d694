using TermLocus.Core.Plants;

namespace TermLocus.Core.Analysis;

/// <summary>The plant-file key behind a spec boundary, shared by the reports, the JSON and the workbench.</summary>
public static class SpecBoundaryKindText
{
    /// <summary>
    /// The key of the limit <paramref name="kind"/> draws. The decay line is set by the strictest of the three
    /// decay-type limits in <paramref name="specs"/>, so that one is named.
    /// </summary>
    public static string Key(this SpecBoundaryKind kind, Specs specs) => kind switch
    {
        SpecBoundaryKind.MinDamping => SpecKind.MinDamping.Key(),
        SpecBoundaryKind.MinNaturalFrequency => SpecKind.MinNaturalFrequency.Key(),
        SpecBoundaryKind.MaxNaturalFrequency => SpecKind.MaxNaturalFrequency.Key(),
        SpecBoundaryKind.MinDecayRate => SpecCheck.Limits(specs)
            .Where(l => l.Spec is SpecKind.MinDecayRate or SpecKind.MaxTimeToHalf or SpecKind.MaxSettlingTime)
            .MaxBy(l => SpecCheck.EquivalentDecayRate(l.Spec, l.Limit)).Spec.Key(),
        _ => kind.ToString(),
    };
}
