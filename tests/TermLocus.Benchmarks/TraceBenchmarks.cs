using System.Numerics;
using BenchmarkDotNet.Attributes;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;

namespace TermLocus.Benchmarks;

/// <summary>
/// Full adaptive locus traces against one bare eigenvalue solve of the same degree. The loop is an invented one:
/// degree/2 lightly to well damped pole pairs on an arc (like a chain of flexible modes) and two real zeros, swept
/// over its automatic range. Targets: degree 10 under 5 ms, degree 30 under 50 ms per trace. The cost per traced
/// value is the trace's mean time divided by the value count printed by the setup.
/// </summary>
[MemoryDiagnoser]
public class TraceBenchmarks
{
    private CharacteristicFamily family = null!;
    private Polynomial midRange = null!;
    private double upper;

    /// <summary>Degree of the characteristic polynomial (even).</summary>
    [Params(10, 30)]
    public int Degree { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        int pairs = Degree / 2;
        var poles = Enumerable.Range(0, pairs).SelectMany(k =>
        {
            double angle = Math.PI * (0.55 + (0.4 * k / Math.Max(1, pairs - 1)));
            var p = Complex.FromPolarCoordinates(1 + (0.1 * k), angle);
            return new[] { p, Complex.Conjugate(p) };
        });
        var zeros = new[] { new Complex(-0.5, 0), new Complex(-1.5, 0) };
        family = CharacteristicFamily.FromAffine(new AffineSplit(Polynomial.FromRoots(poles), Polynomial.FromRoots(zeros)));
        upper = LocusTracer.AutomaticRange(family).High;
        midRange = family.At(Math.Sqrt(upper));
        var trace = LocusTracer.Trace(family, 0, upper);
        Console.WriteLine(FormattableString.Invariant(
            $"// degree {Degree}: range [0, {upper:G4}], {trace.ValueCount} values per trace, complete {trace.Complete}"));
    }

    [Benchmark]
    public LocusTrace FullTrace() => LocusTracer.Trace(family, 0, upper);

    [Benchmark]
    public Complex[] OneEigenvalueSolve() => PolynomialRoots.Find(midRange);
}
