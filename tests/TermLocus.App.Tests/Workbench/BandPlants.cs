using TermLocus.App.Workbench;
using TermLocus.Core.Plants;

namespace TermLocus.App.Tests.Workbench;

/// <summary>Plants with a loop model and toleranced parameters, built in memory (invented examples).</summary>
internal static class BandPlants
{
    /// <summary>
    /// K/(s(s+a)), unity negative feedback: P(s) = s² + a·s + K, swept K in [0, 20], varied a in [1.6, 2.4] (nominal 2),
    /// a second toleranced parameter b in [0.9, 1.1] that the loop does not use. For K &gt; a²/4 the poles are
    /// -a/2 ± j√(K - a²/4), so ζ = a/(2√K) and σ = a/2 (quadratic formula; second-order definitions, Ogata, Modern
    /// Control Engineering, 5th ed., §5-3; from memory).
    /// </summary>
    public static LoadedPlant Quadratic(double k = 5, Specs? specs = null) => CoreBridgeFor(new Plant(
        TestPlants.Folder + "/quadratic.toml",
        "Quadratic loop with a toleranced coefficient (invented example)",
        string.Empty,
        [
            new Parameter("K", k, new Interval(0, 20), null, "A/V", string.Empty, new SourcePosition(5, 1)),
            new Parameter("a", 2, null, new Interval(1.6, 2.4), "1/s", string.Empty, new SourcePosition(6, 1)),
            new Parameter("b", 1, null, new Interval(0.9, 1.1), string.Empty, string.Empty, new SourcePosition(7, 1)),
        ],
        new LoopDefinition(
            ExpressionText.Inline("plant", "b / (b * s * (s + a))"), ExpressionText.Inline("controller", "K"), null,
            FeedbackSign.Negative, null, "K", "a", null, null),
        specs ?? new Specs(MinDamping: 0.4),
        []));

    /// <summary>
    /// A sampled loop given by its characteristic z - c + K (sample time 0.1 s): one real root z = c - K. At K = 0,
    /// c = 0.5 the root halves every sample, so its equivalent s = ln(0.5)/0.1 = -6.931 1/s and its time to half is
    /// exactly one sample, 0.1 s (z = e^{sT}; e.g. Franklin, Powell and Workman, Digital Control of Dynamic Systems,
    /// 3rd ed., §4.3; from memory).
    /// </summary>
    public static LoadedPlant SampledFirstOrder() => CoreBridgeFor(new Plant(
        TestPlants.Folder + "/sampled.toml",
        "Sampled first-order loop (invented example)",
        string.Empty,
        [
            new Parameter("K", 0, new Interval(-1, 1), null, string.Empty, string.Empty, new SourcePosition(5, 1)),
            new Parameter("c", 0.5, null, new Interval(0.4, 0.6), string.Empty, string.Empty, new SourcePosition(6, 1)),
        ],
        new LoopDefinition(null, null, null, FeedbackSign.Negative, ExpressionText.Inline("characteristic", "z - c + K"), "K", null, null, 0.1),
        new Specs(MaxTimeToHalfSeconds: 0.12),
        []));

    /// <summary>
    /// A sampled motor loop K/(s(s + 1)) behind a zero-order hold, T = 1 s, K = 1 nominal: the samples peak at 1.3996
    /// (39.96 %) at k = 3 and 4 (Ogata, Discrete-Time Control Systems, 2nd ed., ch. 4; from memory) and the plant
    /// output between them at 44.88 % (brute-force integration in the Core tests).
    /// </summary>
    public static LoadedPlant SampledMotor(Specs? specs = null) => CoreBridgeFor(new Plant(
        TestPlants.Folder + "/sampled-motor.toml",
        "Sampled motor loop (invented example)",
        string.Empty,
        [new Parameter("K", 1, new Interval(0, 3), null, string.Empty, string.Empty, new SourcePosition(5, 1))],
        new LoopDefinition(
            ExpressionText.Inline("plant", "K / (s * (s + 1))"), null, null, FeedbackSign.Negative, null, "K", null, null, 1.0),
        specs ?? Specs.None,
        []));

    /// <summary>A state with <paramref name="loaded"/> open, its band check delivered and its trace requested (not delivered).</summary>
    public static WorkbenchState Opened(LoadedPlant loaded)
    {
        var (start, _) = Update.Start(null, TestPlants.Folder);
        var (state, effects) = Update.Receive(start, new PlantLoaded(loaded));
        return Settle(state, effects.Where(e => e is not TraceLocusEffect)) with { Message = null };
    }

    /// <summary>Performs <paramref name="effects"/> in line and delivers their messages, as the effect runner would.</summary>
    public static WorkbenchState Settle(WorkbenchState state, IEnumerable<Effect> effects)
    {
        var worker = new EffectWorker(new SaveContext(() => new DateTimeOffset(2026, 1, 2, 3, 4, 5, TimeSpan.Zero), "tester@bench"));
        foreach (var effect in effects)
        {
            if (worker.Perform(effect) is { } message)
            {
                var (next, more) = Update.Receive(state, message);
                state = Settle(next, more.Where(e => e is not TraceLocusEffect));
            }
        }

        return state;
    }

    /// <summary>Applies <paramref name="command"/> and settles the band check and response it asks for.</summary>
    public static WorkbenchState Apply(WorkbenchState state, Command command)
    {
        var (next, effects) = Update.Apply(state, command);
        return Settle(next, effects.Where(e => e is not TraceLocusEffect));
    }

    private static LoadedPlant CoreBridgeFor(Plant plant) => CoreBridge.FromPlant(plant);
}
