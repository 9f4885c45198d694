using BenchmarkDotNet.Attributes;
using TermLocus.Core.Algebra;
using TermLocus.Core.Time;

namespace TermLocus.Benchmarks;

/// <summary>Step response of a degree-10 closed loop over 2,000 samples; target under 2 ms.</summary>
[MemoryDiagnoser]
public class ResponseBenchmarks
{
    private RationalFunction loop = RationalFunction.One;

    [GlobalSetup]
    public void Setup()
    {
        // Five invented second-order sections (ζ, ωn) and a real zero, unit steady-state gain.
        (double Zeta, double Wn)[] sections = [(0.3, 2.0), (0.5, 7.0), (0.7, 15.0), (0.2, 40.0), (0.9, 90.0)];
        var den = Polynomial.One;
        foreach (var (zeta, wn) in sections)
        {
            den *= Polynomial.FromAscending(wn * wn, 2 * zeta * wn, 1);
        }

        var num = Polynomial.FromAscending(1, 0.1) * den[0];
        loop = new RationalFunction(num, den);
    }

    [Benchmark]
    public ResponseTrace StepResponseDegree10Over2000Samples() => StepResponse.Simulate(loop, 20.0, 2000);

    [Benchmark]
    public StepResponseAnalysis FullAnalysisDegree10() => StepResponseAnalysis.Of(loop);
}
