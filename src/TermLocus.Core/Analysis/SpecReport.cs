using System.Collections.Immutable;

namespace TermLocus.Core.Analysis;

/// <summary>The result of <see cref="SpecCheck.Evaluate"/>.</summary>
/// <param name="Outcomes">One entry per limit present in the specs, in <see cref="SpecKind"/> order; empty when there were no poles.</param>
/// <param name="Violations">
/// Every pole outside every limit, grouped by limit in <see cref="SpecKind"/> order, worst first within a limit.
/// A conjugate pair is listed once, by its upper member.
/// </param>
public sealed record SpecReport(ImmutableArray<SpecOutcome> Outcomes, ImmutableArray<SpecViolation> Violations)
{
    /// <summary>True when no pole violates any limit (also when there are no limits or no poles).</summary>
    public bool Passed => Violations.IsEmpty;

    /// <summary>
    /// The limit with the smallest relative margin (<see cref="SpecOutcome.WorstRelativeMargin"/>), with its margin in
    /// its own unit; null when there are no outcomes. Ties go to the earlier <see cref="SpecKind"/>.
    /// </summary>
    public SpecOutcome? WorstMargin
    {
        get
        {
            SpecOutcome? worst = null;
            foreach (var o in Outcomes)
            {
                if (worst is null || o.WorstRelativeMargin < worst.WorstRelativeMargin)
                {
                    worst = o;
                }
            }

            return worst;
        }
    }
}
