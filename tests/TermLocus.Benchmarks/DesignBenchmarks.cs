using System.Collections.Immutable;
using BenchmarkDotNet.Attributes;
using TermLocus.App.Reports;
using TermLocus.App.Text;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.Benchmarks;

/// <summary>
/// <c>termlocus design</c> on each bundled demo plant, without process start and file reading: the span, the robust
/// design (intervals over nominal and corners, the recommended value and its full band check) and the text report.
/// Each plant runs without an overshoot limit and with one (the file's own, or an invented one for files without:
/// see <see cref="InventedOvershootLimits"/>), since judging overshoot simulates step responses.
/// Target: under 200 ms per plant. Run with
/// <c>dotnet run -c Release --project tests/TermLocus.Benchmarks -- --filter *DesignBenchmarks* --job short</c>.
/// </summary>
[MemoryDiagnoser]
public class DesignBenchmarks
{
    /// <summary>
    /// Overshoot limits (percent) for the demo files that set none, chosen to cover the cases: conveyor 12 % binds at
    /// both ends of its pole interval (overshoot 23 % at its low end, 8.9 % in the middle, 14.5 % at its high end);
    /// gimbal 40 % binds at the low end; the bearing and the press never overshoot there. The reflow oven gives only
    /// its characteristic polynomial, so there is no response to judge.
    /// </summary>
    private static readonly ImmutableDictionary<string, double> InventedOvershootLimits = new Dictionary<string, double>
    {
        ["conveyor-speed.toml"] = 12.0,
        ["gimbal-sensor-filter.toml"] = 40.0,
        ["magnetic-bearing.toml"] = 5.0,
        ["press-cylinder-position.toml"] = 5.0,
        ["reflow-oven-zone.toml"] = 10.0,
    }.ToImmutableDictionary();

    private Plant plant = null!;
    private LoopModel model = null!;

    /// <summary>The demo plant's file name in plants/.</summary>
    [Params("conveyor-speed.toml", "digital-servo-axis.toml", "gimbal-sensor-filter.toml", "heat-exchanger-outlet.toml",
        "magnetic-bearing.toml", "press-cylinder-position.toml", "reflow-oven-zone.toml")]
    public string File { get; set; } = string.Empty;

    /// <summary>True: with an overshoot limit (the file's, else an invented one); false: the file's limit removed.</summary>
    [Params(false, true)]
    public bool OvershootLimit { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        var read = PlantFileReader.Read(Path.Combine(PlantsFolder(), File));
        double? limit = OvershootLimit ? read.Specs.MaxOvershootPct ?? InventedOvershootLimits[File] : null;
        plant = read with { Specs = read.Specs with { MaxOvershootPct = limit } };
        model = LoopModel.Create(plant);
    }

    [Benchmark]
    public ImmutableArray<string> Design()
    {
        var values = plant.NominalValues();
        var span = SweepSpan.For(plant, model.Family(plant.Loop.Sweep, values), values[plant.Loop.Sweep]);
        var result = RobustDesign.Find(model, values, span);
        return DesignReportPresenter.Lines(File, plant, result, Glyphs.Ascii);
    }

    // BenchmarkDotNet runs the benchmark from a generated folder under bin/, so the repository is found by walking up.
    private static string PlantsFolder()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (System.IO.File.Exists(Path.Combine(dir.FullName, "TermLocus.sln")))
            {
                return Path.Combine(dir.FullName, "plants");
            }
        }

        throw new InvalidOperationException("TermLocus.sln not found above the benchmark binary.");
    }
}
