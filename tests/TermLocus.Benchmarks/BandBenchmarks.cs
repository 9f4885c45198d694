using System.Collections.Immutable;
using System.Numerics;
using BenchmarkDotNet.Attributes;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.Benchmarks;

/// <summary>
/// The tolerance band of a degree-10 loop with six toleranced parameters, at a new swept value per call (as after a
/// keystroke): the closed-loop poles at all 64 corners (target under 1 ms), and the whole band check that
/// <c>termlocus check</c> and the library list run (corners, then the search inside the band for each spec).
/// </summary>
[MemoryDiagnoser]
public class BandBenchmarks
{
    private const double Step = 0.04;
    private const int StepsEachWay = 20;

    private LoopModel model = null!;
    private Dictionary<string, double> values = [];
    private string plantFile = string.Empty;
    private string swept = string.Empty;
    private double start;
    private int calls;

    [GlobalSetup]
    public void Setup()
    {
        plantFile = FlexibleDrivePlant.WriteToTemporaryFolder();
        var plant = PlantFileReader.Read(plantFile);
        model = LoopModel.Create(plant);
        swept = plant.Loop.Sweep;
        values = new Dictionary<string, double>(plant.NominalValues(), StringComparer.Ordinal);
        start = values[swept];
        var box = ToleranceBox.FromPlant(plant, swept, values);
        int degree = model.Characteristic(values).Degree;
        if (box.CornerCount != 1 << FlexibleDrivePlant.TolerancedCount || degree != FlexibleDrivePlant.Degree)
        {
            throw new InvalidOperationException($"expected degree 10 and 64 corners, got degree {degree} and {box.CornerCount}");
        }
    }

    [GlobalCleanup]
    public void Cleanup() => FlexibleDrivePlant.Delete(plantFile);

    /// <summary>Poles at the 64 corners of the band at the next swept value.</summary>
    [Benchmark]
    public ImmutableArray<BandPoint> CornersOf64()
    {
        values[swept] = NextValue();
        var box = ToleranceBox.FromPlant(model.Plant, swept, values);
        return WorstCaseSearch.EvaluateCorners(box, values, FinitePoles);
    }

    /// <summary>The full check at the next swept value: nominal, the corners and the search inside the band.</summary>
    [Benchmark]
    public LoopCheckResult WholeBandCheck()
    {
        var at = new Dictionary<string, double>(StringComparer.Ordinal) { [swept] = NextValue() };
        return LoopCheck.Run(model, at);
    }

    // The same poles the band check uses for a continuous loop: finite roots of the characteristic polynomial.
    private Complex[] FinitePoles(IReadOnlyDictionary<string, double> at) =>
        [.. PolynomialRoots.FindWithInfinite(model.Characteristic(at)).Finite];

    private double NextValue()
    {
        int phase = calls++ % (2 * StepsEachWay);
        int offset = phase < StepsEachWay ? phase : (2 * StepsEachWay) - phase;
        return start + (offset * Step);
    }
}
