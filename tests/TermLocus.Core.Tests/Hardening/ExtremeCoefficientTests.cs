using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Hardening;

/// <summary>
/// Polynomials whose roots a double cannot carry, found by the fuzz runs. Expected: the root finder refuses (no
/// infinity or NaN comes back as a root), and a plant file that produces one gets a located error from the loop
/// model instead of a failure deep in the analysis.
/// </summary>
public sealed class ExtremeCoefficientTests
{
    public static TheoryData<string, double[]> Unsolvable() => new()
    {
        // 1e-310·s - 897: the root 8.97e312 lies past the largest double 1.8e308 (IEEE 754 binary64, common practice).
        { "root past the double range", [-897.0, -3.7294518363755E-310] },
        // -s^5 + 5e184·s^2 + 6.4e-277: roots near 3.7e61 (three) and 1.1e-231 (two); the geometric-mean scaling
        // leaves monic companion entries near 1e350 (found by the expression fuzz run, seed 3Tw1tra1dP55).
        { "roots spread over 290 decades", [6.449725439999997E-277, 0, 5E+184, 0, 0, -1] },
        // -1e267·s^3 + 1.2639e-77·s^2 - 5.3e-155·s + 7.5e-233: the companion balancing factor overflowed to infinity
        // and the balancing loop never ended (a hang found by the expression fuzz run, seed d9pb7k9tCbS2).
        { "balancing past overflow", [7.477809159699999E-233, -5.3248107E-155, 1.2639E-77, -1E+267] },
    };

    [Theory]
    [MemberData(nameof(Unsolvable))]
    public void The_root_finder_refuses_instead_of_returning_infinities(string what, double[] ascending)
    {
        var p = Polynomial.FromAscending(ascending);
        using var session = new Fuzz.FuzzSession("extreme " + what);

        // Under the fuzz runner's time limit, so that a hang fails the test instead of stalling the run.
        session.Run(() =>
        {
            bool found = PolynomialRoots.TryFind(p, out var roots);
            Assert.True(!found || roots.All(r => double.IsFinite(r.Real) && double.IsFinite(r.Imaginary)), what);
            if (!found)
            {
                Assert.Throws<ArithmeticException>(() => PolynomialRoots.Find(p));
            }
        }, () => what);
    }

    [Theory]
    [InlineData("1e-310*s + Kp", "leading coefficient (1E-310) is negligible")]
    [InlineData("-s^5 + 5e184*s^2 + 6.449725439999997e-277*Kp", "cannot be computed")]
    public void A_plant_file_giving_such_a_polynomial_gets_a_located_error(string characteristic, string expected)
    {
        string text = $"""
            # Invented example for a test: a characteristic whose poles a double cannot carry.
            [parameters]
            Kp = {"{"} value = 1.0, range = [0.0, 2.0] {"}"}

            [loop]
            characteristic = "{characteristic}"
            sweep = "Kp"
            """;
        var model = LoopModel.Create(PlantFileReader.Parse(text, "extreme.toml"));

        var error = Assert.Throws<PlantFileException>(() => model.Characteristic(new Dictionary<string, double>())).Error;

        Assert.Equal(new SourcePosition(6, 19), error.Position);
        Assert.Contains(expected, error.Message, StringComparison.Ordinal);
        Assert.DoesNotContain('\n', error.ToString());
    }

    [Fact]
    public void A_root_at_the_edge_of_the_double_range_is_still_found()
    {
        // 1e-300·s + 1e5 has its root at -1e305, representable (IEEE 754 binary64): found to 1e-12 relative.
        var root = Assert.Single(PolynomialRoots.Find(Polynomial.FromAscending(1e5, 1e-300)));
        Assert.Equal(-1e305, root.Real, 1e305 * 1e-12);
        Assert.Equal(Complex.Zero.Imaginary, root.Imaginary);
    }
}
