using System.Numerics;
using BenchmarkDotNet.Attributes;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearAlgebra.Factorization;
using TermLocus.Core.Algebra;

namespace TermLocus.Benchmarks;

/// <summary>
/// Root finding per traced locus point. The polynomials are closed-loop-like: a fixed-seed mix of stable real poles
/// and lightly to well damped pairs. The floor is MathNet's general eigenvalue solver on the plain companion matrix
/// of the same degree (matrix prebuilt, so only the factorisation is timed).
/// </summary>
[MemoryDiagnoser]
public class RootBenchmarks
{
    private Polynomial polynomial = Polynomial.One;
    private double[] ascending = [];
    private Complex[] destination = [];
    private Matrix<double> companion = Matrix<double>.Build.Dense(1, 1);

    [Params(4, 10, 30)]
    public int Degree { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        var random = new Random(20240611);
        var roots = new List<Complex>();
        while (roots.Count < Degree)
        {
            double decay = 0.2 + (5.0 * random.NextDouble());
            if (Degree - roots.Count >= 2 && random.Next(3) > 0)
            {
                var pole = new Complex(-decay, 0.5 + (6.0 * random.NextDouble()));
                roots.Add(pole);
                roots.Add(Complex.Conjugate(pole));
            }
            else
            {
                roots.Add(new Complex(-decay, 0));
            }
        }

        polynomial = Polynomial.FromRoots(roots).Scale(3.7);
        ascending = [.. polynomial.Coefficients];
        destination = new Complex[Degree];
        companion = Matrix<double>.Build.Dense(Degree, Degree);
        for (int i = 0; i < Degree; i++)
        {
            companion[0, i] = -polynomial[Degree - 1 - i] / polynomial.Leading;
            if (i > 0)
            {
                companion[i, i - 1] = 1.0;
            }
        }
    }

    [Benchmark(Baseline = true)]
    public Complex[] Find() => PolynomialRoots.Find(polynomial);

    [Benchmark]
    public int TryFindIntoSpan()
    {
        PolynomialRoots.TryFind(ascending, destination, RootFindingOptions.Default, out int count);
        return count;
    }

    [Benchmark]
    public Evd<double> MathNetCompanionEvd() => companion.Evd(Symmetricity.Asymmetric);
}
