using System.Globalization;
using System.Numerics;
using CsCheck;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Analysis;

/// <summary>
/// Robust design against brute force: random third-order loops K (s + z) / ((s + a)(s + b)(s + c)) with a toleranced,
/// judged on a dense grid of K with roots from MathNet (an independent root finder) and the pole figures computed here
/// from their definitions (ζ = −Re s / |s|, σ = −Re s; common practice).
/// </summary>
public class RobustDesignPropertyTests
{
    private const int DenseSamples = 1500;

    /// <summary>Points closer than this to a limit (relative margin) or to the axis are too close to call either way.</summary>
    private const double Undecided = 1e-7;

    private sealed record RandomLoop(double A, double B, double C, double Z, double TolerancePct, double MinDamping, double MinDecayShare)
    {
        public double[] CornersOfA => [A * (1 - (TolerancePct / 100)), A, A * (1 + (TolerancePct / 100))];

        public double MinDecayRate => MinDecayShare * Math.Min(A * (1 - (TolerancePct / 100)), B);

        // Beyond the Routh crossing of the nominal loop without its zero, so the span holds unstable gains too.
        public double SpanEnd => 4.0 * (((A + B + C) * ((A * B) + (B * C) + (C * A))) - (A * B * C)) / Z;

        public string Text => string.Create(CultureInfo.InvariantCulture, $$"""
            title = "random third-order loop"
            [parameters]
            K = { value = 1.0, range = [0.0, {{SpanEnd}}] }
            a = { value = {{A}}, tolerance_pct = {{TolerancePct}} }
            b = {{B}}
            c = {{C}}
            zc = {{Z}}
            [loop]
            plant = "(s + zc)/((s + a)*(s + b)*(s + c))"
            controller = "K"
            sweep = "K"
            [specs]
            min_damping = {{MinDamping}}
            min_decay_rate = {{MinDecayRate}}
            """);
    }

    private static readonly Gen<RandomLoop> Loops =
        Gen.Select(Gen.Double[0.3, 5.0], Gen.Double[0.3, 5.0], Gen.Double[2.0, 30.0], Gen.Double[0.5, 40.0],
                Gen.Double[5.0, 40.0], Gen.Double[0.1, 0.85], Gen.Double[0.05, 0.95])
            .Select((a, b, c, z, tol, zeta, decay) => new RandomLoop(a, b, c, z, tol, zeta, decay));

    [Fact]
    public void Every_feasible_sample_lies_in_an_interval_and_every_interval_midpoint_is_feasible()
    {
        Loops.Sample(loop =>
        {
            var plant = PlantFileReader.Parse(loop.Text, "random.toml");
            var result = RobustDesign.Find(LoopModel.Create(plant), plant.NominalValues(), plant.SweptParameter.Range!.Value);
            double end = loop.SpanEnd, slack = 1e-9 * end;
            for (int i = 0; i < DenseSamples; i++)
            {
                double k = end * i / (DenseSamples - 1);
                bool? feasible = Judge(loop, k);
                bool inside = result.Intervals.Any(v => k >= v.From - slack && k <= v.To + slack);
                bool deepInside = result.Intervals.Any(v => k > v.From + slack && k < v.To - slack);
                if (feasible is true && !inside)
                {
                    return false;
                }

                if (feasible is false && deepInside)
                {
                    return false;
                }
            }

            return result.Intervals.All(v => Judge(loop, (v.From + v.To) / 2.0) is not false);
        }, iter: 40);
    }

    // True when every pole at every a in the band's corners and nominal meets both limits and is stable, false when
    // one clearly misses, null when too close to call.
    private static bool? Judge(RandomLoop loop, double k)
    {
        double smallest = double.PositiveInfinity;
        foreach (double a in loop.CornersOfA)
        {
            // (s + a)(s + b)(s + c) + k (s + z), ascending coefficients.
            double b = loop.B, c = loop.C;
            double[] coefficients = [(a * b * c) + (k * loop.Z), (a * b) + (b * c) + (c * a) + k, a + b + c, 1.0];
            foreach (Complex s in MathNet.Numerics.FindRoots.Polynomial(coefficients))
            {
                double sigma = -s.Real, zeta = sigma / s.Magnitude;
                smallest = Math.Min(smallest, Math.Min(sigma / s.Magnitude, (zeta - loop.MinDamping) / loop.MinDamping));
                smallest = Math.Min(smallest, (sigma - loop.MinDecayRate) / loop.MinDecayRate);
            }
        }

        return smallest > Undecided ? true : smallest < -Undecided ? false : null;
    }
}
