using BenchmarkDotNet.Attributes;
using TermLocus.Core.Algebra;
using TermLocus.Core.Time;

namespace TermLocus.Benchmarks;

/// <summary>
/// Step response of a degree-10 closed loop over 2,000 samples, and of a sampled degree-10 loop over 2,000 sample
/// intervals with the plant output between samples (10 points a sample, 20,001 points); targets under 2 ms each.
/// </summary>
[MemoryDiagnoser]
public class ResponseBenchmarks
{
    private const double SampleTime = 0.01;
    private const int Samples = 2000;

    private RationalFunction loop = RationalFunction.One;
    private RationalFunction plant = RationalFunction.One;
    private RationalFunction controller = RationalFunction.One;
    private int pointsPerSample;

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

        // The same sections as a plant of degree 10 (unit steady-state gain) held every 10 ms (|p|·T up to 0.9) under a
        // proportional gain of 0.5.
        plant = new RationalFunction(Polynomial.Constant(den[0]), den);
        controller = RationalFunction.Constant(0.5);
        pointsPerSample = HeldLoopResponse.PointsPerSample(plant, SampleTime, Samples);
    }

    [Benchmark]
    public ResponseTrace StepResponseDegree10Over2000Samples() => StepResponse.Simulate(loop, 20.0, 2000);

    [Benchmark]
    public StepResponseAnalysis FullAnalysisDegree10() => StepResponseAnalysis.Of(loop);

    [Benchmark]
    public SampledLoopTrace SampledBetweenSamplesDegree10Over2000Samples() =>
        HeldLoopResponse.Simulate(controller, plant, RationalFunction.One, false, SampleTime, 0.0, Samples, pointsPerSample);
}
