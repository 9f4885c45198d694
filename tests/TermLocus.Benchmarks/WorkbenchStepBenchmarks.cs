using System.Runtime.CompilerServices;
using BenchmarkDotNet.Attributes;
using TermLocus.App.Workbench;

namespace TermLocus.Benchmarks;

/// <summary>
/// What one keystroke costs on the UI thread, on two demo plants (a PI conveyor loop with a toleranced inertia; a heat
/// exchanger with a transport delay, whose band check simulates the overshoot through the delay): a step of
/// the swept value (poles, trails across the band, per-pole band figures; the band check and the trace are effects
/// and not part of it) and a step of the varied parameter (the loop rebuilt at the new place in the band). Target:
/// under 5 ms each, so a held arrow key stays smooth. The band check an effect then runs is measured on its own.
/// </summary>
[MemoryDiagnoser]
[MedianColumn]
public class WorkbenchStepBenchmarks
{
    private WorkbenchState opened = WorkbenchState.Initial(null);
    private EffectWorker worker = new(new SaveContext(() => DateTimeOffset.UnixEpoch, "bench@host"));
    private CheckBandEffect check = null!;

    /// <summary>The demo plant file.</summary>
    [Params("conveyor-speed.toml", "heat-exchanger-outlet.toml")]
    public string File { get; set; } = "conveyor-speed.toml";

    [GlobalSetup]
    public void Setup()
    {
        var loaded = (PlantLoaded)worker.Perform(new LoadPlantEffect(Plant(File)))!;
        opened = Update.Receive(Update.Start(null, null).State, loaded).State;
        check = new CheckBandEffect(loaded.Loaded, loaded.Loaded.Plant.SweptParameter.Value * 1.1);
    }

    [Benchmark]
    public WorkbenchState SweptValueStep() => Update.Apply(opened, Command.StepSweepUp).State;

    [Benchmark]
    public WorkbenchState BandStep() => Update.Apply(opened, Command.StepBandUp).State;

    [Benchmark]
    public Message? BandCheckEffect() => worker.Perform(check);

    private static string Plant(string file, [CallerFilePath] string here = "") =>
        Path.GetFullPath(Path.Combine(Path.GetDirectoryName(here)!, "..", "..", "plants", file));
}
