using System.Collections.Immutable;
using System.Numerics;
using TermLocus.App.Workbench;
using TermLocus.Core.Analysis;
using TermLocus.Core.Algebra;
using TermLocus.Core.Plants;

namespace TermLocus.Tests.Tui;

/// <summary>Hand-built plants for screen tests, with loci known in closed form (no tracer involved).</summary>
internal static class ScreenPlants
{
    public const string Folder = "/plants";

    /// <summary>
    /// K/(s(s+2)), unity negative feedback: P(s) = s² + 2s + K. Closed-form locus: for 0 ≤ K ≤ 1 the real poles
    /// -1 ± √(1-K), for K &gt; 1 the pair -1 ± j√(K-1) (quadratic formula). Spec ζ ≥ 0.5 is met up to K = 4, where
    /// ζ = 1/√K = 0.5.
    /// </summary>
    public static LoadedPlant SecondOrder(double k = 2) => new(
        new Plant(
            Folder + "/second.toml",
            "Textbook second-order loop (invented example)",
            string.Empty,
            [new Parameter("K", k, new Interval(0, 20), null, "A/V", string.Empty, new SourcePosition(5, 1))],
            new LoopDefinition(
                ExpressionText.Inline("plant", "1 / (s*(s + 2))"), ExpressionText.Inline("controller", "K"), null,
                FeedbackSign.Negative, null, "K", null, null, null),
            new Specs(MinDamping: 0.5),
            []),
        CharacteristicFamily.FromAffine(new AffineSplit(Polynomial.FromAscending(0, 2, 1), Polynomial.One)),
        new Interval(0, 20),
        [Complex.Zero, new Complex(-2, 0)],
        []);

    /// <summary>The closed-form locus of <see cref="SecondOrder"/> over [0, 20], with the ζ = 0.5 boundary at K = 4
    /// and the break point at K = 1.</summary>
    public static LocusAnalysis SecondOrderLocus(LoadedPlant loaded)
    {
        var upper = new List<LocusPoint>();
        var lower = new List<LocusPoint>();
        for (int i = 0; i <= 400; i++)
        {
            double k = 20.0 * i / 400;
            if (k <= 1)
            {
                double d = Math.Sqrt(1 - k);
                upper.Add(new LocusPoint(k, new Complex(-1 + d, 0)));
                lower.Add(new LocusPoint(k, new Complex(-1 - d, 0)));
            }
            else
            {
                double w = Math.Sqrt(k - 1);
                upper.Add(new LocusPoint(k, new Complex(-1, w)));
                lower.Add(new LocusPoint(k, new Complex(-1, -w)));
            }
        }

        return new LocusAnalysis(
            loaded.NominalKey,
            [upper.ToImmutableArray(), lower.ToImmutableArray()],
            [new SweepMark(1, SweepMarkKind.BreakPoint, null), new SweepMark(4, SweepMarkKind.SpecBoundary, "min_damping")]);
    }

    public static ImmutableArray<LibraryItem> Library() =>
    [
        new LibraryItem(Folder + "/crane.toml", "crane.toml", "Gantry crane sway (invented example)", LibraryVerdict.Fail, "min_damping"),
        new LibraryItem(Folder + "/second.toml", "second.toml", "Textbook second-order loop (invented example)", LibraryVerdict.Pass, null),
        new LibraryItem(Folder + "/broken.toml", "broken.toml", null, LibraryVerdict.Error, "broken.toml:3:7: error: expected '='"),
    ];
}
