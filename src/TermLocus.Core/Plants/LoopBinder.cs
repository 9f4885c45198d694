using System.Globalization;
using TermLocus.Core.Algebra;
using TermLocus.Core.Expressions;
using TermLocus.Core.Time;

namespace TermLocus.Core.Plants;

/// <summary>
/// Parses the expressions of a <c>[loop]</c> table in the right variable and builds its <see cref="LoopPath"/>:
/// continuous (everything in s, a delay as a Padé factor) or sampled (controller and a given characteristic in z,
/// plant and sensor in s).
/// </summary>
internal static class LoopBinder
{
    /// <summary>Checks the delay and sample time of <paramref name="loop"/>.</summary>
    /// <exception cref="ArgumentException">A delay that is negative or not finite, or a sample time not above 0.</exception>
    public static void CheckTimes(LoopDefinition loop)
    {
        if (loop.DelaySeconds is double d && !(double.IsFinite(d) && d >= 0.0))
        {
            throw new ArgumentException("The loop's delay must be a finite number of seconds, 0 or above.", nameof(loop));
        }

        if (loop.SampleTimeSeconds is double t && !(double.IsFinite(t) && t > 0.0))
        {
            throw new ArgumentException("The loop's sample time must be a finite number of seconds above 0.", nameof(loop));
        }
    }

    /// <summary>The given characteristic: a polynomial in s, or in z when the loop is sampled.</summary>
    public static LoopExpression BindCharacteristic(Plant plant, ParameterSlots slots)
    {
        var loop = plant.Loop;
        bool sampled = loop.SampleTimeSeconds is not null;
        var given = Bind(loop.Characteristic!, plant, slots, sampled, "characteristic");
        int division = given.Parsed.FirstDivisionByVariable();
        if (division >= 0)
        {
            string variable = sampled ? ExpressionNames.ShiftVariable : ExpressionNames.LaplaceVariable;
            throw new PlantFileException(given.Parsed.ErrorAt(
                division, $"the characteristic must be a polynomial in {variable}: it cannot divide by an expression containing {variable}"));
        }

        if (loop.DelaySeconds is > 0.0)
        {
            throw new PlantFileException(given.Parsed.ErrorAt(
                0, "a delay cannot be applied to a given characteristic polynomial: give plant (and controller, sensor) instead"));
        }

        return given;
    }

    /// <summary>The path of a loop built from plant, controller and sensor.</summary>
    public static LoopPath BindPath(Plant plant, ParameterSlots slots, int delayOrder)
    {
        var loop = plant.Loop;
        double delay = loop.DelaySeconds ?? 0.0;
        var g = Bind(loop.Plant!, plant, slots, false, "plant");
        var h = loop.Sensor is null ? null : Bind(loop.Sensor, plant, slots, false, "sensor");
        bool sampled = loop.SampleTimeSeconds is not null;
        var c = loop.Controller is null ? null : Bind(loop.Controller, plant, slots, sampled, "controller");
        if (loop.SampleTimeSeconds is double t)
        {
            if (!SampleDelay.TrySplit(delay, t, out var split))
            {
                throw new PlantFileException(g.Parsed.ErrorAt(0, string.Create(
                    CultureInfo.InvariantCulture,
                    $"the delay ({delay:R} s) spans more than {SampleDelay.MaximumWholeSamples} sample intervals of {t:R} s")));
            }

            CheckDegree([c, g, h], split.WholeSamples + (split.RemainderSeconds > 0.0 ? 1 : 0), g.Parsed);
            return new SampledLoopPath(c, g, h, t, delay);
        }

        var pade = delay > 0.0 ? PadeApproximant.Delay(delay, delayOrder) : null;
        CheckDegree([c, g, h], pade is null ? 0 : delayOrder, g.Parsed);
        return new ContinuousLoopPath(c, g, h, pade);
    }

    private static LoopExpression Bind(ExpressionText text, Plant plant, ParameterSlots slots, bool inZ, string what)
    {
        if (!inZ)
        {
            return LoopExpression.Bind(text, plant.Path, slots.SlotByName);
        }

        try
        {
            return LoopExpression.Bind(text, plant.Path, slots.SlotByName, ExpressionNames.ShiftVariable);
        }
        catch (PlantFileException e) when (WrittenInS(text, plant.Path))
        {
            throw new PlantFileException(e.Error with { Message = $"with sample_time set, write the {what} in z ('s' belongs to continuous time)" });
        }
    }

    // True when the text reads as an expression in s: then the only thing wrong in z is the variable, and the z
    // parse failed at its first use.
    private static bool WrittenInS(ExpressionText text, string file) =>
        ExpressionParser.TryParse(text, file, out var asS, out _) && asS.ContainsVariable;

    private static void CheckDegree(LoopExpression?[] path, int extra, ParsedExpression blame)
    {
        var bound = new DegreeBound(extra, extra);
        foreach (var part in path)
        {
            bound = DegreeBound.Product(bound, part?.Parsed.Degree ?? DegreeBound.Constant);
        }

        if (bound.Max > ExpressionLimits.MaxDegree)
        {
            throw new PlantFileException(blame.ErrorAt(
                0, $"degree too high: controller*plant*sensor would reach degree {bound.Max} (at most {ExpressionLimits.MaxDegree})"));
        }
    }
}
