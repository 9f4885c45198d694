using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Checks a loop at given values against its specs, at nominal and across the tolerance box of its toleranced
/// parameters (the swept parameter is the value being chosen, so it is not part of the box). The same function
/// serves <c>termlocus check</c> and the workbench, so both always print the same numbers.
/// </summary>
public static class LoopCheck
{
    /// <summary>
    /// Checks <paramref name="model"/> at <paramref name="values"/> (missing names take their nominal value).
    /// Every figure is judged at those values themselves as well as over the box, so a toleranced value given outside
    /// its band (which callers should refuse, as the plant-file reader does) can never pass by being left out.
    /// </summary>
    /// <exception cref="PlantFileException">The loop cannot be formed at some point of the box.</exception>
    /// <exception cref="ArgumentException">A value names no parameter or is not finite.</exception>
    public static LoopCheckResult Run(LoopModel model, IReadOnlyDictionary<string, double> values)
    {
        ArgumentNullException.ThrowIfNull(model);
        var plant = model.Plant;
        var full = plant.NominalValues().SetItems(values);
        var source = new LoopPoles(model);
        var (poles, infinite) = source.At(full);
        var box = ToleranceBox.FromPlant(plant, plant.Loop.Sweep, full);
        var corners = WorstCaseSearch.EvaluateCorners(box, full, source.Finite);
        var nominal = new BandPoint(NominalOf(box), poles, IsCorner: false);
        var band = SpecCheck.Limits(plant.Specs)
            .Select(limit => Worst(limit.Spec, limit.Limit, box, full, corners, nominal, source))
            .ToImmutableArray();
        var (nominalOvershoot, worstOvershoot) = OvershootCheck.NominalAndWorst(model, full, box);
        if (worstOvershoot is not null)
        {
            band = band.Add(worstOvershoot);
        }

        BandMinimum? worstDamping = poles.IsEmpty ? null
            : Lower(WorstCaseSearch.Minimize(box, full, corners, LowestDamping, source.Finite), nominal, LowestDamping);
        BandMinimum? worstDecay = poles.IsEmpty ? null
            : Lower(WorstCaseSearch.Minimize(box, full, corners, LowestDecayRate, source.Finite), nominal, LowestDecayRate);
        bool stable = poles.All(source.IsStable) && corners.All(c => c.Poles.All(source.IsStable))
            && (worstDecay is null || worstDecay.At.Poles.All(source.IsStable));
        return new LoopCheckResult(
            full, poles, infinite, model.HiddenPoles(full), SpecCheck.Evaluate(plant.Specs, poles), box, band,
            worstDamping, worstDecay, stable)
        {
            NominalOvershoot = nominalOvershoot,
            PoleSpread = PoleSpread(model, full),
        };
    }

    // Two more root solves of the nominal polynomial: cheap beside the band search, and the only way a user learns
    // that the digits of (s+1)^40's poles are noise.
    private static double? PoleSpread(LoopModel model, IReadOnlyDictionary<string, double> values)
    {
        var characteristic = model.Characteristic(values);
        var roots = model.CharacteristicRoots(values);
        return roots.InfiniteCount > 0 || characteristic.Degree != roots.Finite.Length
            ? null
            : RootUncertainty.RelativeSpread(characteristic, roots.Finite);
    }

    /// <summary>
    /// The pole limits alone at <paramref name="values"/> (missing names take their nominal value), from the same
    /// closed-loop poles <see cref="Run"/> uses, without the band search or any simulation: for reports that show a
    /// pole-based figure (such as <c>max_settling_time</c>, judged as 4/σ of the slowest pole) beside a simulated one.
    /// </summary>
    /// <exception cref="PlantFileException">The loop cannot be formed at these values.</exception>
    public static SpecReport PoleSpecs(LoopModel model, IReadOnlyDictionary<string, double> values)
    {
        ArgumentNullException.ThrowIfNull(model);
        var full = model.Plant.NominalValues().SetItems(values);
        return SpecCheck.Evaluate(model.Plant.Specs, new LoopPoles(model).At(full).Finite);
    }

    private static double LowestDamping(IReadOnlyList<Complex> poles) =>
        poles.Count == 0 ? double.PositiveInfinity : poles.Min(p => PoleMetrics.Of(p).Damping ?? 0.0);

    private static double LowestDecayRate(IReadOnlyList<Complex> poles) =>
        poles.Count == 0 ? double.PositiveInfinity : poles.Min(p => -p.Real);

    // The values of the toleranced parameters at the point checked. Normally inside the box, but a caller may pass
    // one outside its band; that point is then judged as well, never skipped for lying outside the box searched.
    private static ImmutableDictionary<string, double> NominalOf(ToleranceBox box) =>
        box.Axes.ToImmutableDictionary(a => a.Name, a => a.Nominal, StringComparer.Ordinal);

    // The worse of the box's minimum and the nominal point (the box search starts from the corners only).
    private static BandMinimum Lower(BandMinimum inBox, BandPoint nominal, Func<IReadOnlyList<Complex>, double> figure)
    {
        double atNominal = figure(nominal.Poles);
        return atNominal < inBox.Value ? new BandMinimum(atNominal, nominal) : inBox;
    }

    private static BandOutcome Worst(
        SpecKind kind, double limit, ToleranceBox box, IReadOnlyDictionary<string, double> values,
        ImmutableArray<BandPoint> corners, BandPoint nominal, LoopPoles source)
    {
        var only = OnlyThis(kind, limit);
        double Figure(IReadOnlyList<Complex> poles) =>
            SpecCheck.Evaluate(only, poles).Outcomes is { Length: > 0 } o ? o[0].WorstRelativeMargin : double.PositiveInfinity;
        var worst = Lower(WorstCaseSearch.Minimize(box, values, corners, Figure, source.Finite), nominal, Figure);
        var outcome = SpecCheck.Evaluate(only, worst.At.Poles).Outcomes.FirstOrDefault();
        return outcome is null
            ? new BandOutcome(kind, limit, null, double.PositiveInfinity, double.PositiveInfinity, Complex.Zero, worst.At.Toleranced, worst.At.IsCorner)
            : new BandOutcome(kind, limit, outcome.WorstActual, outcome.WorstMargin, outcome.WorstRelativeMargin,
                outcome.WorstPole, worst.At.Toleranced, worst.At.IsCorner);
    }

    // A Specs record holding only one limit, so one figure can be searched on its own.
    private static Specs OnlyThis(SpecKind kind, double limit) => kind switch
    {
        SpecKind.MinDamping => new Specs(MinDamping: limit),
        SpecKind.MinDecayRate => new Specs(MinDecayRate: limit),
        SpecKind.MaxTimeToHalf => new Specs(MaxTimeToHalfSeconds: limit),
        SpecKind.MaxSettlingTime => new Specs(MaxSettlingTimeSeconds: limit),
        SpecKind.MinNaturalFrequency => new Specs(MinNaturalFrequency: limit),
        SpecKind.MaxNaturalFrequency => new Specs(MaxNaturalFrequency: limit),
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "Not a pole limit."),
    };
}
