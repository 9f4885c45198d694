using System.Numerics;
using TermLocus.Core.Analysis;

namespace TermLocus.Core.Tests.Hardening;

/// <summary>
/// Asserts that results meant for the screen or JSON hold no NaN or infinity: every number is finite, or the field
/// is explicitly null. A traced point must also lie within the far limit the trace promises (no huge garbage).
/// </summary>
internal static class FiniteResults
{
    public static void Check(LocusTrace trace)
    {
        Finite(trace.From, "trace.From");
        Finite(trace.To, "trace.To");
        Finite(trace.Scale, "trace.Scale");
        Assert.True(trace.Scale > 0, "trace scale must be positive");
        foreach (var drop in trace.DegreeDrops)
        {
            Finite(drop, "degree drop");
        }

        foreach (var branch in trace.Branches)
        {
            Assert.NotEmpty(branch.Points);
            foreach (var point in branch.Points)
            {
                Finite(point.Value, "branch value");
                Finite(point.Pole, "branch pole");
                Assert.InRange(point.Value, trace.From, trace.To);
            }
        }
    }

    /// <summary>Every traced pole within <paramref name="limit"/> rad/s (the far limit times the scale, with slack).</summary>
    public static void CheckWithin(LocusTrace trace, double limit)
    {
        Check(trace);
        foreach (var point in trace.Branches.SelectMany(b => b.Points))
        {
            Assert.True(point.Pole.Magnitude <= limit, $"traced pole {point.Pole} at {point.Value} lies beyond {limit}");
        }
    }

    public static void Check(LocusFacts facts)
    {
        Finite(facts.From, "facts.From");
        Finite(facts.To, "facts.To");
        facts.OpenLoopPoles.ToList().ForEach(p => Finite(p, "open-loop pole"));
        facts.OpenLoopZeros.ToList().ForEach(z => Finite(z, "open-loop zero"));
        foreach (var set in facts.Asymptotes)
        {
            Finite(set.Centroid, "asymptote centroid");
            set.AnglesDegrees.ToList().ForEach(a => Finite(a, "asymptote angle"));
        }

        foreach (var b in facts.BreakPoints)
        {
            Finite(b.Location, "break point");
            Finite(b.Value, "break point value");
        }

        foreach (var c in facts.AxisCrossings)
        {
            Finite(c.Omega, "crossing omega");
            Finite(c.Value, "crossing value");
        }

        foreach (var d in facts.DepartureAngles.Concat(facts.ArrivalAngles))
        {
            Finite(d.At, "angle-condition point");
            Finite(d.AngleDegrees, "angle");
        }

        foreach (var i in facts.StableIntervals)
        {
            Finite(i.From, "stable from");
            Finite(i.To, "stable to");
        }
    }

    public static void Check(IEnumerable<SpecBoundary> boundaries)
    {
        foreach (var b in boundaries)
        {
            Finite(b.Limit, "boundary limit");
            Finite(b.Value, "boundary value");
            Finite(b.Pole, "boundary pole");
            b.Poles.ToList().ForEach(p => Finite(p, "boundary poles"));
        }
    }

    public static void Check(SpecReport report)
    {
        // A time limit on a pole that does not decay has margin minus infinity by contract (SpecViolation.Margin);
        // what is printed is its null Actual, so the margin is allowed to be -inf there and nowhere else.
        foreach (var o in report.Outcomes)
        {
            Finite(o.Limit, "outcome limit");
            Finite(o.WorstPole, "outcome pole");
            Optional(o.WorstActual, "outcome actual");
            MarginOrNoDecay(o.WorstMargin, o.WorstActual, "outcome margin");
            MarginOrNoDecay(o.WorstRelativeMargin, o.WorstActual, "outcome relative margin");
        }

        foreach (var v in report.Violations)
        {
            Finite(v.Limit, "violation limit");
            Finite(v.Pole, "violation pole");
            Optional(v.Actual, "violation actual");
            MarginOrNoDecay(v.Margin, v.Actual, "violation margin");
        }
    }

    public static void Check(PoleMetrics m)
    {
        Finite(m.Pole, "metrics pole");
        Optional(m.Damping, "damping");
        Finite(m.NaturalFrequency, "natural frequency");
        Finite(m.DecayRate, "decay rate");
        Finite(m.DampedFrequency, "damped frequency");
        Optional(m.TimeToHalfSeconds, "time to half");
        Optional(m.TimeToDoubleSeconds, "time to double");
        Optional(m.SettlingTime2PctSeconds, "settling time");
    }

    private static void MarginOrNoDecay(double margin, double? actual, string what)
    {
        if (!(actual is null && double.IsNegativeInfinity(margin)))
        {
            Finite(margin, what);
        }
    }

    private static void Optional(double? value, string what)
    {
        if (value is { } v)
        {
            Finite(v, what);
        }
    }

    private static void Finite(double value, string what) =>
        Assert.True(double.IsFinite(value), $"{what} is {value}");

    private static void Finite(Complex value, string what) =>
        Assert.True(double.IsFinite(value.Real) && double.IsFinite(value.Imaginary), $"{what} is {value}");
}
