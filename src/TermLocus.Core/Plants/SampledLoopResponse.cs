using TermLocus.Core.Algebra;
using TermLocus.Core.Time;

namespace TermLocus.Core.Plants;

/// <summary>
/// The step response of a sampled loop (<see cref="LoopResponse"/>'s z-plane half): the hybrid simulation
/// (<see cref="HeldLoopResponse"/>) with the plant output between samples when the parts allow it, else the output
/// at the sample instants alone from the closed loop in z.
/// </summary>
internal static class SampledLoopResponse
{
    public static LoopResponse Analyse(LoopModel model, IReadOnlyDictionary<string, double> values, RationalFunction closed)
    {
        double t = model.Plane.SampleTimeSeconds!.Value;
        var parts = model.SampledParts(values)!;
        int samples = Samples(closed, parts, t, model.DelaySeconds);
        double? steady = StepFigures.SteadyStateOfSampled(closed);
        bool stable = LoopStability.IsStableInZ(closed.Denominator);
        var estimate = Estimate(model, closed);
        string? warning = model.SamplingWarning(values);
        if (BetweenSamples(model, parts, samples, out string? why) is { } held)
        {
            return new LoopResponse(
                model.Plane, ResponseMethod.SampledBetweenSamples, held.BetweenSamples, stable, steady,
                StepFigures.FromBetweenSamples(held.BetweenSamples, steady, held.PointsPerSample), estimate, null, warning)
            {
                SampleTrace = held.AtSamples,
                SampleFigures = StepFigures.FromSamples(held.AtSamples, steady),
                PointsPerSample = held.PointsPerSample,
            };
        }

        var trace = StepResponse.SimulateSampled(closed, t, samples);
        var figures = StepFigures.FromSamples(trace, steady);
        string note = "the plant output between samples is not shown: " + why;
        return new LoopResponse(
            model.Plane, ResponseMethod.Sampled, trace, stable, steady, figures, estimate, null, warning is null ? note : warning + "; " + note)
        {
            SampleTrace = trace,
            SampleFigures = figures,
        };
    }

    private static SampledLoopTrace? BetweenSamples(LoopModel model, SampledLoopParts parts, int samples, out string? why)
    {
        double t = model.Plane.SampleTimeSeconds!.Value;
        int points = HeldLoopResponse.PointsPerSample(parts.Plant, t, samples);
        if (!HeldLoopResponse.TrySimulate(
                parts.Controller, parts.Plant, parts.Sensor, model.IsPositiveFeedback, t, model.DelaySeconds, samples, points, out var held, out why))
        {
            return null;
        }

        why = held.BetweenSamples.Outputs.All(double.IsFinite) ? null : "it overflows between the sample instants";
        return why is null ? held : null;
    }

    // Long enough for the output at the instants and for the controller output: a controller pole that cancels a zero
    // of the held plant (a sampling zero near −1, say) leaves the instants at once but rings on in u, and so in the
    // plant output between samples.
    private static int Samples(RationalFunction closed, SampledLoopParts parts, double t, double delay)
    {
        int output = ResponseGrid.ForSampled(closed, t, delay).Samples;
        var control = new RationalFunction(parts.Controller.Numerator * parts.HeldDenominator, closed.Denominator);
        return control.Numerator.Degree > control.Denominator.Degree
            ? output
            : Math.Max(output, ResponseGrid.ForSampled(control, t, delay).Samples);
    }

    private static SecondOrderEstimate? Estimate(LoopModel model, RationalFunction closed)
    {
        var equivalent = PolynomialRoots.Find(closed.Denominator)
            .Select(model.Plane.ToEquivalentS)
            .Where(s => double.IsFinite(s.Real) && double.IsFinite(s.Imaginary))
            .ToArray();
        return equivalent.Length == 0 ? null : SecondOrderEstimate.FromPoles(equivalent, model.DelaySeconds);
    }
}
