using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;

namespace TermLocus.Core.Tests.Analysis;

/// <summary>Builds the characteristic family A(s) + K·B(s) of a unity-feedback loop K·B(s)/A(s) from textbook data.</summary>
internal static class Loops
{
    /// <summary>Loop K·N(s)/D(s), polynomials given highest power first as textbooks print them.</summary>
    internal static CharacteristicFamily Descending(double[] numerator, double[] denominator) =>
        CharacteristicFamily.FromAffine(new AffineSplit(
            Polynomial.FromDescending(denominator), Polynomial.FromDescending(numerator)));

    /// <summary>Loop K·Π(s − z)/Π(s − p) from real poles and zeros.</summary>
    internal static CharacteristicFamily FromRoots(double[] poles, double[] zeros) =>
        FromRoots(poles.Select(p => new Complex(p, 0)), zeros.Select(z => new Complex(z, 0)));

    internal static CharacteristicFamily FromRoots(IEnumerable<Complex> poles, IEnumerable<Complex> zeros) =>
        CharacteristicFamily.FromAffine(new AffineSplit(Polynomial.FromRoots(poles), Polynomial.FromRoots(zeros)));

    /// <summary>Open-loop polynomial s·Π… handy products.</summary>
    internal static Polynomial Product(params double[][] descendingFactors) =>
        descendingFactors.Aggregate(Polynomial.One, (acc, f) => acc * Polynomial.FromDescending(f));
}
