using CsCheck;

namespace TermLocus.Core.Tests.Fuzz;

/// <summary>
/// Mutated demo plants through the whole loading pipeline (<see cref="PlantPipeline"/>): reader, loop model,
/// characteristic at the nominal values, its roots and the spec check. The only allowed outcomes are success or a
/// one-line, located <see cref="TermLocus.Core.Plants.PlantFileException"/> without control characters (plant-file
/// design, "Expressions"; terminal-ux design point 8), each within <see cref="FuzzSettings.CaseTimeout"/>.
/// CI runs 1500 cases; set TERMLOCUS_FUZZ_ITERATIONS for a long run.
/// </summary>
public sealed class PlantFileFuzzTests
{
    [Fact]
    public void Mutated_plant_files_load_or_fail_with_a_located_one_line_error()
    {
        using var session = new FuzzSession("plant files");
        long loaded = 0;
        PlantFileMutations.File.Sample(
            file => session.Run(() =>
            {
                if (PlantPipeline.Run(file.Bytes))
                {
                    Interlocked.Increment(ref loaded);
                }
            }, file.ToString),
            seed: FuzzSettings.Seed,
            iter: FuzzSettings.Iterations(1500),
            threads: FuzzSettings.Threads,
            print: f => f.ToString());
        FuzzSettings.Report($"plant files: {Interlocked.Read(ref loaded)} of {session.Cases} loaded and solved");
    }
}
