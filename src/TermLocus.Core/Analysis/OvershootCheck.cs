using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Analysis;

/// <summary>
/// The <c>max_overshoot_pct</c> limit, checked on the simulated closed-loop step response (not on the poles) at the
/// given values and at every corner of the tolerance box. For a sampled loop the overshoot is that of the plant output
/// between samples (<see cref="LoopResponse.Figures"/> with <see cref="ResponseMethod.SampledBetweenSamples"/>), not
/// only of the sample instants: a peak the samples miss still counts. Interior points of the box are not searched for this
/// limit: each point costs a full simulation.
/// </summary>
public static class OvershootCheck
{
    /// <summary>
    /// The worst overshoot over the nominal point and the corners, as a band outcome; null when the specs set no
    /// overshoot limit or the loop has no reference-to-output path (a file giving only the characteristic polynomial).
    /// An unstable point counts as an unbounded overshoot (margin minus infinity, actual null).
    /// </summary>
    public static BandOutcome? Worst(LoopModel model, IReadOnlyDictionary<string, double> values, ToleranceBox box) =>
        NominalAndWorst(model, values, box).Worst;

    /// <summary>
    /// The overshoot at <paramref name="values"/> themselves (its <see cref="BandOutcome.At"/> empty) and the worst over
    /// that point and the corners, from one set of simulations; both null when the specs set no overshoot limit or the
    /// loop has no reference-to-output path. The nominal outcome is the first point of the search, so when it is the
    /// worst the two are the same record.
    /// </summary>
    public static (BandOutcome? Nominal, BandOutcome? Worst) NominalAndWorst(
        LoopModel model, IReadOnlyDictionary<string, double> values, ToleranceBox box)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(box);
        if (model.Plant.Specs.MaxOvershootPct is not double limit)
        {
            return (null, null);
        }

        var work = new Dictionary<string, double>(values, StringComparer.Ordinal);
        BandOutcome? nominal = Measure(model, work, limit, ImmutableDictionary<string, double>.Empty, atCorner: false);
        if (nominal is null)
        {
            return (null, null);
        }

        var worst = nominal;
        for (int c = 0; c < box.CornerCount; c++)
        {
            box.WriteCorner(c, work);
            var outcome = Measure(model, work, limit, box.Corner(c), atCorner: true);
            if (outcome is not null && outcome.WorstMargin < worst.WorstMargin)
            {
                worst = outcome;
            }
        }

        return (nominal, worst);
    }

    /// <summary>
    /// The overshoot at one point as a band outcome: null when there is no response to judge
    /// (<see cref="LoopResponse.IsAvailable"/> false); margin minus infinity when the loop is unstable or its steady
    /// state is 0. The one measurement both this check and <see cref="RobustDesign"/> use, so they agree to the bit.
    /// </summary>
    internal static BandOutcome? Measure(
        LoopModel model, IReadOnlyDictionary<string, double> values, double limit, ImmutableDictionary<string, double> at, bool atCorner)
    {
        var response = LoopResponse.Analyse(model, values);
        if (!response.IsAvailable)
        {
            return null;
        }

        Complex pole = response.Estimate?.Poles.FirstOrDefault() ?? Complex.Zero;
        if (response.Figures?.OvershootPct is not double overshoot)
        {
            return new BandOutcome(SpecKind.MaxOvershootPct, limit, null, double.NegativeInfinity, double.NegativeInfinity, pole, at, atCorner);
        }

        double margin = limit - overshoot;
        return new BandOutcome(SpecKind.MaxOvershootPct, limit, overshoot, margin, limit == 0 ? margin : margin / limit, pole, at, atCorner);
    }
}
