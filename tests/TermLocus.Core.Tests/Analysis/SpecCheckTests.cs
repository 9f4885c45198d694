using System.Numerics;
using CsCheck;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Analysis;

public class SpecCheckTests
{
    // Poles -3 ± 4j (ζ = 0.6, ωn = 5, σ = 3) and -1 (ζ = 1, ωn = 1, σ = 1); figures from the second-order relations
    // (Nise, Control Systems Engineering, 6th ed., §4.6, from memory), margins worked by hand.
    private static readonly Complex[] ThreePoles = [new(-3, -4), new(-3, 4), new(-1, 0)];

    [Fact]
    public void Each_limit_reports_its_worst_pole_and_signed_margin()
    {
        var specs = new Specs(
            MinDamping: 0.5, MinDecayRate: 2, MaxTimeToHalfSeconds: 0.5, MaxSettlingTimeSeconds: 2,
            MinNaturalFrequency: 0.5, MaxNaturalFrequency: 4);
        var report = SpecCheck.Evaluate(specs, ThreePoles);

        Assert.False(report.Passed);
        Assert.Equal(6, report.Outcomes.Length);
        var damping = report.Outcomes[0];
        Assert.Equal("min_damping", damping.Key);
        Assert.Equal(0.6, damping.WorstActual!.Value, 1e-15);
        Assert.Equal(0.1, damping.WorstMargin, 1e-15);
        Assert.Equal(new Complex(-3, 4), damping.WorstPole);
        Assert.True(damping.Met);

        var decay = report.Outcomes[1];
        Assert.Equal(1.0, decay.WorstActual!.Value, 1e-15);
        Assert.Equal(-1.0, decay.WorstMargin, 1e-15);
        Assert.Equal(new Complex(-1, 0), decay.WorstPole);

        Assert.Equal(0.5 - Math.Log(2), report.Outcomes[2].WorstMargin, 1e-15);
        Assert.Equal(2.0 - 4.0, report.Outcomes[3].WorstMargin, 1e-15);
        Assert.Equal(1.0 - 0.5, report.Outcomes[4].WorstMargin, 1e-15);
        Assert.Equal(4.0 - 5.0, report.Outcomes[5].WorstMargin, 1e-15);
    }

    [Fact]
    public void Violations_name_the_key_limit_actual_margin_and_pole_and_list_a_pair_once()
    {
        var report = SpecCheck.Evaluate(new Specs(MinDecayRate: 2, MaxNaturalFrequency: 4), ThreePoles);
        Assert.Equal(2, report.Violations.Length);

        var decay = report.Violations[0];
        Assert.Equal("min_decay_rate", decay.Key);
        Assert.Equal(2.0, decay.Limit);
        Assert.Equal(1.0, decay.Actual!.Value, 1e-15);
        Assert.Equal(-1.0, decay.Margin, 1e-15);
        Assert.Equal(new Complex(-1, 0), decay.Pole);

        var frequency = report.Violations[1];
        Assert.Equal("max_natural_frequency", frequency.Key);
        Assert.Equal(5.0, frequency.Actual!.Value, 1e-15);
        Assert.Equal(new Complex(-3, 4), frequency.Pole);
    }

    [Fact]
    public void A_pole_at_the_origin_fails_min_damping_with_no_actual_value()
    {
        // An integrator pole does not decay; it is checked as ζ = 0 (see SpecCheck docs), damping itself undefined.
        var report = SpecCheck.Evaluate(new Specs(MinDamping: 0.3), [Complex.Zero, new Complex(-2, 0)]);
        var v = Assert.Single(report.Violations);
        Assert.Null(v.Actual);
        Assert.Equal(-0.3, v.Margin, 1e-15);
        Assert.Equal(Complex.Zero, v.Pole);
    }

    [Fact]
    public void A_pole_that_does_not_decay_never_meets_a_time_limit()
    {
        var report = SpecCheck.Evaluate(
            new Specs(MaxTimeToHalfSeconds: 10, MaxSettlingTimeSeconds: 10), [new Complex(0.5, 1), new Complex(0.5, -1), new Complex(0, 0)]);
        Assert.Equal(4, report.Violations.Length);
        Assert.All(report.Violations, v =>
        {
            Assert.Null(v.Actual);
            Assert.Equal(double.NegativeInfinity, v.Margin);
        });
        Assert.Null(report.Outcomes[0].WorstActual);
    }

    [Fact]
    public void The_worst_margin_ranks_limits_by_margin_relative_to_the_limit()
    {
        // ζ margin 0.1 on a limit of 0.5 is 20 %; decay-rate margin 0.5 on a limit of 0.5 is 100 %: damping is worst.
        var report = SpecCheck.Evaluate(new Specs(MinDamping: 0.5, MinDecayRate: 0.5), ThreePoles);
        Assert.True(report.Passed);
        var worst = report.WorstMargin!;
        Assert.Equal(SpecKind.MinDamping, worst.Spec);
        Assert.Equal(0.1, worst.WorstMargin, 1e-15);
        Assert.Equal(0.2, worst.WorstRelativeMargin, 1e-15);
    }

    [Fact]
    public void No_limits_or_no_poles_pass()
    {
        Assert.True(SpecCheck.Evaluate(Specs.None, ThreePoles).Passed);
        Assert.Null(SpecCheck.Evaluate(Specs.None, ThreePoles).WorstMargin);
        var empty = SpecCheck.Evaluate(new Specs(MinDamping: 0.7), []);
        Assert.True(empty.Passed);
        Assert.Empty(empty.Outcomes);
    }

    [Fact]
    public void Decay_type_limits_convert_to_one_required_decay_rate()
    {
        // Time to half T needs σ >= ln2/T; the 2 % settling estimate Ts needs σ >= 4/Ts (common practice).
        Assert.Equal(Math.Log(2) / 0.5, SpecCheck.EquivalentDecayRate(SpecKind.MaxTimeToHalf, 0.5), 1e-15);
        Assert.Equal(2.0, SpecCheck.EquivalentDecayRate(SpecKind.MaxSettlingTime, 2.0), 1e-15);
        Assert.Equal(2.0, SpecCheck.RequiredDecayRate(new Specs(MinDecayRate: 1.5, MaxTimeToHalfSeconds: 0.5, MaxSettlingTimeSeconds: 2))!.Value, 1e-15);
        Assert.Equal(Math.Log(2) / 0.25, SpecCheck.RequiredDecayRate(new Specs(MinDecayRate: 1.5, MaxTimeToHalfSeconds: 0.25))!.Value, 1e-15);
        Assert.Null(SpecCheck.RequiredDecayRate(new Specs(MinDamping: 0.5)));
        Assert.Throws<ArgumentException>(() => SpecCheck.EquivalentDecayRate(SpecKind.MinDamping, 0.5));
    }

    [Fact]
    public void A_time_limit_is_met_exactly_when_the_decay_rate_meets_its_equivalent()
    {
        Gen.Select(Gen.Double[-5.0, 20.0], Gen.Double[0.01, 10.0], Gen.Double[-10.0, 10.0]).Sample((sigma, limit, omega) =>
        {
            var poles = new[] { new Complex(-sigma, omega) };
            foreach (var (specs, kind) in new[] { (new Specs(MaxTimeToHalfSeconds: limit), SpecKind.MaxTimeToHalf), (new Specs(MaxSettlingTimeSeconds: limit), SpecKind.MaxSettlingTime) })
            {
                double required = SpecCheck.EquivalentDecayRate(kind, limit);
                if (Math.Abs(sigma - required) > 1e-9 * required)
                {
                    Assert.Equal(sigma >= required, SpecCheck.Evaluate(specs, poles).Passed);
                }
            }
        }, iter: 300);
    }

    [Fact]
    public void Bad_limits_and_poles_are_rejected()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => SpecCheck.Evaluate(new Specs(MaxTimeToHalfSeconds: 0), ThreePoles));
        Assert.Throws<ArgumentException>(() => SpecCheck.Evaluate(new Specs(MinDamping: double.NaN), ThreePoles));
        Assert.Throws<ArgumentException>(() => SpecCheck.Evaluate(Specs.None, [new Complex(double.NaN, 0)]));
    }

    [Fact]
    public void Keys_round_trip_and_overshoot_is_not_a_pole_limit()
    {
        foreach (var kind in Enum.GetValues<SpecKind>())
        {
            Assert.True(SpecKindText.TryParseKey(kind.Key(), out var parsed));
            Assert.Equal(kind, parsed);
        }

        // Overshoot is a limit of its own kind, but it is checked on the simulated response, never on the poles.
        Assert.True(SpecKindText.TryParseKey("max_overshoot_pct", out var overshoot));
        Assert.Empty(SpecCheck.Limits(new TermLocus.Core.Plants.Specs(MaxOvershootPct: 10)));
        Assert.Equal("%", overshoot.Unit());
        Assert.Equal("1/s", SpecKind.MinDecayRate.Unit());
    }
}
