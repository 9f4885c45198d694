using System.Collections.Immutable;
using BenchmarkDotNet.Attributes;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.Benchmarks;

/// <summary>
/// Loops with a delay or a sample time (invented rig: PI controller on a two-lag plant). Targets: the exact delayed
/// step response under 10 ms; one numeric sampled-family value (a fresh hold equivalent) under 100 µs.
/// </summary>
[MemoryDiagnoser]
public class DelayedAndSampledLoopBenchmarks
{
    private static readonly Dictionary<string, double> Nominal = [];
    private LoopModel delayed = null!;
    private CharacteristicFamily byPole = null!;

    [GlobalSetup]
    public void Setup()
    {
        delayed = LoopModel.Create(Rig(delay: 0.3, sampleTime: null, controller: "Kc*(s + 2)/s"));
        var sampled = LoopModel.Create(Rig(delay: null, sampleTime: 0.05, controller: "Kc*(z - 0.9)/(z - 1)"));
        byPole = sampled.Family("a", Nominal);
    }

    [Benchmark]
    public LoopResponse ExactDelayedStepResponse() => LoopResponse.Analyse(delayed, Nominal);

    [Benchmark]
    public Polynomial SampledFamilyValueWithFreshHold() => byPole.At(1.3);

    private static Plant Rig(double? delay, double? sampleTime, string controller)
    {
        ImmutableArray<Parameter> parameters =
        [
            new("Kc", 0.5, null, null, string.Empty, string.Empty, new SourcePosition(1, 1)),
            new("a", 1.0, null, null, string.Empty, string.Empty, new SourcePosition(2, 1)),
        ];
        var loop = new LoopDefinition(
            ExpressionText.Inline("plant", "1/((s + a)*(0.2*s + 1))"),
            ExpressionText.Inline("controller", controller),
            null,
            FeedbackSign.Negative,
            null,
            "Kc",
            null,
            delay,
            sampleTime);
        return new Plant("bench.toml", "benchmark rig (invented)", string.Empty, parameters, loop, Specs.None, []);
    }
}
