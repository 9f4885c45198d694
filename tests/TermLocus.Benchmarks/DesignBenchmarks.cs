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
/// Target: under 200 ms per plant. Run with
/// <c>dotnet run -c Release --project tests/TermLocus.Benchmarks -- --filter *DesignBenchmarks* --job short</c>.
/// </summary>
[MemoryDiagnoser]
public class DesignBenchmarks
{
    private Plant plant = null!;
    private LoopModel model = null!;

    /// <summary>The demo plant's file name in plants/.</summary>
    [Params("conveyor-speed.toml", "gimbal-sensor-filter.toml", "magnetic-bearing.toml",
        "press-cylinder-position.toml", "reflow-oven-zone.toml")]
    public string File { get; set; } = string.Empty;

    [GlobalSetup]
    public void Setup()
    {
        plant = PlantFileReader.Read(Path.Combine(PlantsFolder(), File));
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
