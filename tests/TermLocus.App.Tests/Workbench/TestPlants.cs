using System.Collections.Immutable;
using System.Numerics;
using TermLocus.App.Workbench;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.App.Tests.Workbench;

/// <summary>Hand-built plants and states for workbench tests (no file reading involved).</summary>
internal static class TestPlants
{
    public const string Folder = "/plants";

    /// <summary>
    /// The textbook loop K/(s(s+2)) with unity negative feedback: P(s) = s² + 2s + K. For K &gt; 1 the poles are
    /// -1 ± j√(K-1), so at K = 5: -1 ± j2, ζ = 1/√5, ωn = √5 (second-order formulas, e.g. Ogata, Modern Control
    /// Engineering, 5th ed., §5-3; from memory).
    /// </summary>
    public static LoadedPlant SecondOrder(double k = 5, Specs? specs = null, string path = Folder + "/second.toml", string title = "Textbook second-order loop")
    {
        var plant = new Plant(
            path,
            title,
            "Invented example for tests.",
            [new Parameter("K", k, new Interval(0, 20), null, "A/V", string.Empty, new SourcePosition(5, 1))],
            new LoopDefinition(
                ExpressionText.Inline("plant", "1 / (s*(s + 2))"),
                ExpressionText.Inline("controller", "K"),
                null,
                FeedbackSign.Negative,
                null,
                "K",
                null,
                null,
                null),
            specs ?? new Specs(MinDamping: 0.4),
            []);
        var family = CharacteristicFamily.FromAffine(new AffineSplit(Polynomial.FromAscending(0, 2, 1), Polynomial.One));
        return new LoadedPlant(plant, family, new Interval(0, 20), [Complex.Zero, new Complex(-2, 0)], []);
    }

    /// <summary>A state with <paramref name="loaded"/> open (its trace not yet back), as after PlantLoaded.</summary>
    public static WorkbenchState Opened(LoadedPlant? loaded = null)
    {
        var (start, _) = Update.Start(null, Folder);
        var (state, _) = Update.Receive(start, new PlantLoaded(loaded ?? SecondOrder()));
        return state with { Message = null };
    }

    /// <summary><see cref="Opened"/> with a trace carrying <paramref name="marks"/> delivered.</summary>
    public static WorkbenchState Traced(params SweepMark[] marks)
    {
        var state = Opened();
        var key = state.Session!.Loaded.NominalKey;
        var analysis = new LocusAnalysis(key, [RealBranch(0, 1, 0, -1), RealBranch(0, 1, -2, -1)], [.. marks]);
        return Update.Receive(state, new LocusTraced(analysis)).State;
    }

    /// <summary>A two-point branch from (value0, re0) to (value1, re1) on the real axis.</summary>
    public static ImmutableArray<LocusPoint> RealBranch(double value0, double value1, double re0, double re1) =>
        [new LocusPoint(value0, new Complex(re0, 0)), new LocusPoint(value1, new Complex(re1, 0))];

    /// <summary>Applies commands in order, returning the final state and the effects of the last.</summary>
    public static (WorkbenchState State, ImmutableArray<Effect> Effects) Run(WorkbenchState state, params Command[] commands)
    {
        ImmutableArray<Effect> effects = [];
        foreach (var command in commands)
        {
            (state, effects) = Update.Apply(state, command);
        }

        return (state, effects);
    }

    public static ImmutableArray<LibraryItem> LibraryItems() =>
    [
        new LibraryItem(Folder + "/crane.toml", "crane.toml", "Gantry crane sway", LibraryVerdict.Fail, "min_damping"),
        new LibraryItem(Folder + "/second.toml", "second.toml", "Textbook second-order loop", LibraryVerdict.Pass, null),
        new LibraryItem(Folder + "/broken.toml", "broken.toml", null, LibraryVerdict.Error, "broken.toml:3:7: error: expected '='"),
    ];
}
