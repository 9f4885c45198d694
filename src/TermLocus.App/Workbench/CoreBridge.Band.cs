using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.App.Workbench;

/// <summary>The band half of the bridge: the loop at a place in the band, the band-wide check, trails, sensitivities.</summary>
internal static partial class CoreBridge
{
    /// <summary>Intervals the varied parameter's band is sampled at to draw the trails.</summary>
    public const int TrailDivisions = 40;

    /// <summary>
    /// The loop with the varied parameter at its place in the band (every other parameter nominal); false with the
    /// reason when the loop cannot be formed there.
    /// </summary>
    public static bool TryLoopAt(LoadedPlant loaded, VariedPosition varied, out CurrentLoop loop, out string? problem)
    {
        loop = CurrentLoop.Nominal(loaded);
        problem = null;
        if (varied.Parameter is null || varied.IsNominal || loaded.Model is not { } model)
        {
            return true;
        }

        var values = loaded.Plant.NominalValues().SetItem(varied.Parameter, varied.Value);
        try
        {
            var family = model.Family(loaded.Plant.Loop.Sweep, values);
            var split = family.Affine;
            loop = new CurrentLoop(values, family, Roots(split?.A), Roots(split?.B), TraceKey.For(loaded.Plant, values));
            return true;
        }
        catch (Exception e) when (e is PlantFileException or ArgumentException or ArithmeticException)
        {
            problem = e is PlantFileException p ? p.Error.Message : e.Message;
            return false;
        }
    }

    /// <summary>The trails across <paramref name="varied"/>'s band at <paramref name="sweptValue"/>. Cheap.</summary>
    public static BandAnalysis BandAt(LoadedPlant loaded, double sweptValue, VariedPosition varied)
    {
        if (loaded.Model is not { } model || varied.Parameter is not { } name)
        {
            return BandAnalysis.None(sweptValue) with { Parameter = varied.Parameter };
        }

        var values = loaded.Plant.NominalValues().SetItem(loaded.Plant.Loop.Sweep, sweptValue);
        try
        {
            var family = model.Family(name, values);
            return new BandAnalysis(sweptValue, name, Trails(family, varied), family);
        }
        catch (Exception e) when (e is PlantFileException or ArgumentException or ArithmeticException)
        {
            // No trails: the band can still be checked and stepped.
            return new BandAnalysis(sweptValue, name, [], null);
        }
    }

    /// <summary>
    /// The check <c>termlocus check</c> runs at <paramref name="sweptValue"/>, every other parameter nominal (0.2 ms for
    /// the demo conveyor, 0.6 ms for the heat exchanger whose overshoot is simulated through its delay, once the code
    /// is compiled; tens of milliseconds on the first runs after start-up).
    /// </summary>
    public static BandCheck CheckBand(LoadedPlant loaded, double sweptValue)
    {
        if (loaded.Model is not { } model)
        {
            return new BandCheck(sweptValue, null, "this plant has no loop model to check");
        }

        try
        {
            var values = loaded.Plant.NominalValues().SetItem(loaded.Plant.Loop.Sweep, sweptValue);
            return new BandCheck(sweptValue, LoopCheck.Run(model, values), null);
        }
        catch (Exception e) when (e is PlantFileException or ArgumentException or ArithmeticException or InvalidOperationException)
        {
            return new BandCheck(sweptValue, null, e is PlantFileException p ? p.Error.Message : e.Message);
        }
    }

    /// <summary>The closed-loop step response at <paramref name="values"/> and the key's swept value (well under 10 ms).</summary>
    public static ResponseView Simulate(LoadedPlant loaded, IReadOnlyDictionary<string, double> values, ResponseKey key)
    {
        if (loaded.Model is not { } model)
        {
            return new ResponseView(key, null, "this plant has no loop model to simulate");
        }

        try
        {
            var all = values.ToImmutableDictionary().SetItem(loaded.Plant.Loop.Sweep, key.SweptValue);
            var response = LoopResponse.Analyse(model, all);
            return new ResponseView(key, response, response.Failure);
        }
        catch (Exception e) when (e is PlantFileException or ArgumentException or ArithmeticException or InvalidOperationException)
        {
            return new ResponseView(key, null, e is PlantFileException p ? p.Error.Message : e.Message);
        }
    }

    /// <summary>Worst figures across the band and sensitivities of every pole of <paramref name="poles"/>.</summary>
    public static ImmutableArray<PoleBandFigures> BandFigures(PoleSnapshot poles, BandAnalysis band, VariedPosition varied)
    {
        if (band.Parameter is null || band.Parameter != varied.Parameter)
        {
            return [];
        }

        var plane = poles.Plane;
        return PoleRows.Group(poles.Poles, plane)
            .Select(row =>
            {
                var trail = TrailOf(band.Trails, row.Pole, varied.Value);
                var metrics = trail.Select(p => plane.MetricsOf(p.Pole)).Where(m => m is not null).Select(m => m!).ToList();
                double? worstZeta = metrics.Where(m => m.Damping is not null).Select(m => m.Damping).Min();
                double? worstSigma = metrics.Count > 0 ? metrics.Min(m => m.DecayRate) : null;
                var (dz, ds, multiple) = Sensitivity(band.VariedFamily, plane, row.Pole, varied.Value);
                return new PoleBandFigures(row.Pole, worstZeta, worstSigma, dz, ds, multiple);
            })
            .ToImmutableArray();
    }

    private static ImmutableArray<ImmutableArray<LocusPoint>> Trails(CharacteristicFamily family, VariedPosition varied)
    {
        var band = varied.Band;
        var samples = new List<(double Value, ImmutableArray<Complex> Roots)>();
        var values = Enumerable.Range(0, TrailDivisions + 1)
            .Select(i => i == TrailDivisions ? band.High : band.Low + (band.Width * i / TrailDivisions))
            .Append(varied.Nominal)
            .Distinct()
            .Order();
        foreach (double v in values)
        {
            try
            {
                samples.Add((v, LocusTracer.PolesAt(family, v)));
            }
            catch (Exception e) when (e is PlantFileException or ArgumentException)
            {
                samples.Add((v, []));
            }
        }

        return TrailLinker.Link(samples);
    }

    // The trail whose point at (nearest to) the varied value lies nearest the pole.
    private static ImmutableArray<LocusPoint> TrailOf(ImmutableArray<ImmutableArray<LocusPoint>> trails, Complex pole, double value)
    {
        var best = ImmutableArray<LocusPoint>.Empty;
        double bestDistance = double.PositiveInfinity;
        foreach (var trail in trails)
        {
            var at = trail.MinBy(p => Math.Abs(p.Value - value));
            double d = Complex.Abs(at.Pole - pole);
            if (d < bestDistance)
            {
                bestDistance = d;
                best = trail;
            }
        }

        return best;
    }

    private static (double? Damping, double? DecayRate, bool Multiple) Sensitivity(
        CharacteristicFamily? family, LoopPlane plane, Complex root, double value)
    {
        if (family is null || value == 0 || plane.MetricsOf(root) is not { } before)
        {
            return (null, null, false);
        }

        try
        {
            if (!PoleSensitivity.TryCompute(family, value, root, out var slope))
            {
                return (null, null, true);
            }

            // First order: the root moves by slope × 1 % of the value; ζ and σ are read at both places.
            var moved = plane.MetricsOf(root + (slope * 0.01 * Math.Abs(value)));
            if (moved is null)
            {
                return (null, null, false);
            }

            double? dz = before.Damping is double z0 && moved.Damping is double z1 ? z1 - z0 : null;
            return (dz, moved.DecayRate - before.DecayRate, false);
        }
        catch (Exception e) when (e is ArgumentException or PlantFileException)
        {
            return (null, null, false);
        }
    }
}
