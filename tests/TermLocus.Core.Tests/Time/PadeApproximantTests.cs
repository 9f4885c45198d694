using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Time;

namespace TermLocus.Core.Tests.Time;

public class PadeApproximantTests
{
    [Fact]
    public void First_and_second_order_match_the_textbook_forms()
    {
        // (1 − sT/2)/(1 + sT/2) and (1 − sT/2 + (sT)²/12)/(1 + sT/2 + (sT)²/12)
        // (G. F. Franklin, J. D. Powell, A. Emami-Naeini, Feedback Control of Dynamic Systems, delay section, from memory).
        const double t = 0.3;
        var first = PadeApproximant.Delay(t, 1);
        AssertCoefficients([1, -t / 2], first.Numerator);
        AssertCoefficients([1, t / 2], first.Denominator);
        var second = PadeApproximant.Delay(t, 2);
        AssertCoefficients([1, -t / 2, t * t / 12], second.Numerator);
        AssertCoefficients([1, t / 2, t * t / 12], second.Denominator);
    }

    [Theory]
    [InlineData(3)]
    [InlineData(4)]
    [InlineData(7)]
    public void Coefficients_follow_the_factorial_formula(int n)
    {
        // cₖ = (2n−k)!·n!/((2n)!·k!·(n−k)!) (Baker & Graves-Morris, Padé Approximants, 2nd ed., ch. 1, from memory),
        // evaluated here with exact integer factorials.
        const double t = 1.7;
        var pade = PadeApproximant.Delay(t, n);
        for (int k = 0; k <= n; k++)
        {
            double c = (double)(Factorial(2 * n - k) * Factorial(n))
                       / (double)(Factorial(2 * n) * Factorial(k) * Factorial(n - k));
            double expected = c * Math.Pow(t, k);
            Assert.Equal(expected, pade.Denominator[k], 1e-14 * Math.Max(1, expected));
            Assert.Equal((k % 2 == 0 ? 1 : -1) * expected, pade.Numerator[k], 1e-14 * Math.Max(1, expected));
        }
    }

    [Fact]
    public void Approximant_is_all_pass_with_stable_poles()
    {
        // |e^{−jωT}| = 1, matched exactly by N(jω) = conj(D(jω)) (common practice).
        var pade = PadeApproximant.Delay(0.2);
        foreach (double w in new[] { 0.1, 1.0, 5.0, 50.0, 500.0 })
        {
            Assert.Equal(1.0, Complex.Abs(pade.Evaluate(new Complex(0, w))), 1e-13);
        }

        Assert.All(PolynomialRoots.Find(pade.Denominator), p => Assert.True(p.Real < 0));
    }

    [Fact]
    public void Default_order_phase_error_is_as_documented()
    {
        // Phase of the approximant unwrapped along jω against the true −ωT. The leading error term
        // (n!)²/((2n)!(2n+1)!)·(ωT)^{2n+1} is the classical remainder of the exponential's Padé approximant
        // (Baker & Graves-Morris, ch. 1, from memory).
        Assert.Equal(3, PadeApproximant.DefaultOrder);
        const double delay = 0.01;
        var pade = PadeApproximant.Delay(delay);
        var error = PhaseErrors(pade, delay, [0.5, 1.0, 2.0, 3.0, 4.0]);
        double lead = 36.0 / (720.0 * 5040.0);
        Assert.Equal(lead * Math.Pow(0.5, 7), error[0], 0.01 * lead * Math.Pow(0.5, 7));
        Assert.InRange(error[1], 0.0, 1e-5);
        Assert.Equal(0.062, Degrees(error[2]), 0.001);
        Assert.Equal(0.857, Degrees(error[3]), 0.001);
        Assert.Equal(4.685, Degrees(error[4]), 0.001);
    }

    [Fact]
    public void Zero_delay_is_one_and_bad_arguments_are_refused()
    {
        var none = PadeApproximant.Delay(0.0);
        Assert.Equal(1.0, none.Evaluate(new Complex(3, 4)).Real, 0.0);
        Assert.Throws<ArgumentOutOfRangeException>(() => PadeApproximant.Delay(-1.0));
        Assert.Throws<ArgumentOutOfRangeException>(() => PadeApproximant.Delay(1.0, 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => PadeApproximant.Delay(1.0, PadeApproximant.MaximumOrder + 1));
    }

    // Phase error (approximant minus −ωT) in radians at the given ωT, unwrapped on a fine frequency grid.
    private static double[] PhaseErrors(RationalFunction pade, double delay, double[] omegaT)
    {
        var result = new double[omegaT.Length];
        double phase = 0.0, previous = 0.0;
        int next = 0;
        const int steps = 400000;
        for (int i = 1; i <= steps && next < omegaT.Length; i++)
        {
            double x = 4.0 * i / steps;
            double raw = pade.Evaluate(new Complex(0, x / delay)).Phase;
            double jump = raw - previous;
            jump -= 2 * Math.PI * Math.Round(jump / (2 * Math.PI));
            phase += jump;
            previous = raw;
            if (Math.Abs(x - omegaT[next]) < 1e-12)
            {
                result[next++] = phase + x;
            }
        }

        return result;
    }

    private static double Degrees(double radians) => radians * 180.0 / Math.PI;

    private static System.Numerics.BigInteger Factorial(int n)
    {
        System.Numerics.BigInteger f = 1;
        for (int i = 2; i <= n; i++)
        {
            f *= i;
        }

        return f;
    }

    private static void AssertCoefficients(double[] expected, Polynomial actual)
    {
        Assert.Equal(expected.Length - 1, actual.Degree);
        for (int k = 0; k < expected.Length; k++)
        {
            Assert.Equal(expected[k], actual[k], 1e-15);
        }
    }
}
