using System.Globalization;
using BenchmarkDotNet.Attributes;
using TermLocus.Core.Plants;

namespace TermLocus.Benchmarks.Plants;

/// <summary>
/// Listing a library of 1,000 plant files (each read and validated) must take well under a second;
/// run with <c>dotnet run -c Release --project tests/TermLocus.Benchmarks -- --filter *PlantLibrary*</c>.
/// </summary>
[MemoryDiagnoser]
public class PlantLibraryScanBenchmark
{
    private const int FileCount = 1000;

    // A typical demo-sized file (about 1.5 KB), varied per copy so no two are identical.
    private const string Template = """
        # Invented example for a benchmark.
        title = "Conveyor {0}"
        note = "PI speed loop; J toleranced, Kp swept. Padding to reach a realistic size for a plant file in a library."

        [parameters]
        Kp    = {{ value = {1}, range = [0.0, 150.0], unit = "A/(rad/s)", note = "speed controller proportional gain" }}
        wi    = {{ value = 8.0, unit = "rad/s", note = "integral corner of the PI controller" }}
        Kt    = {{ value = 1.2, unit = "N*m/A", note = "motor torque constant" }}
        J     = {{ value = 0.42, band = [0.30, 0.65], unit = "kg*m^2", note = "inertia reflected to the motor" }}
        B     = {{ value = 0.08, unit = "N*m*s/rad", note = "belt and roller drag" }}
        tau_i = {{ value = 0.004, unit = "s", note = "closed current loop, seen as a first-order lag" }}

        [loop]
        plant      = "Kt / ((J*s + B) * (tau_i*s + 1))"
        controller = "Kp * (s + wi) / s"
        sweep = "Kp"
        vary  = "J"

        [specs]
        min_damping = 0.5
        max_time_to_half = 0.15
        max_natural_frequency = 400

        [[operating_points]]
        name = "first"
        saved = 2026-11-30T14:05:00Z
        by = "bench@rig"
        values = {{ Kp = 6.0 }}
        verdict = "meets all specs"
        note = ""
        """;

    private string folder = string.Empty;

    [GlobalSetup]
    public void CreateLibrary()
    {
        folder = Directory.CreateDirectory(Path.Combine(Path.GetTempPath(), "termlocus-bench-" + Guid.NewGuid().ToString("N"))).FullName;
        for (var i = 0; i < FileCount; i++)
        {
            var text = string.Format(CultureInfo.InvariantCulture, Template, i, 1.0 + (i % 50));
            File.WriteAllText(Path.Combine(folder, $"plant-{i:D4}.toml"), text);
        }
    }

    [GlobalCleanup]
    public void DeleteLibrary() => Directory.Delete(folder, recursive: true);

    [Benchmark]
    public int ScanThousandFiles() => PlantLibrary.Scan(folder).Length;

    [Benchmark]
    public Plant ReadOneFile() => PlantFileReader.Read(Path.Combine(folder, "plant-0000.toml"));
}
