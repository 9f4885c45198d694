using System.Collections.Immutable;
using BenchmarkDotNet.Attributes;
using TermLocus.App.Canvas;
using TermLocus.App.Text;
using TermLocus.App.Workbench;

namespace TermLocus.Benchmarks;

/// <summary>
/// One arrow-key step of the workbench on a degree-10 loop at 160x48, everything the UI thread does but the terminal
/// output: the update (new value, closed-loop poles, spec check, trails across the band), then the s-plane, pole
/// table, parameter panel and status lines rendered to text for the panes of the 160x48 layout. Target: under 2 ms
/// median. The locus is traced once in the setup, as in the workbench, where a step does not trace again; the band
/// check a step asks for runs off the UI thread (see <see cref="BandBenchmarks"/> and WorkbenchStepBenchmarks).
/// </summary>
[MemoryDiagnoser]
[MedianColumn]
public class KeystrokeScreenBenchmarks
{
    private const int Width = 160;
    private const int Height = 48;
    private const int StepsEachWay = 20;

    private readonly Glyphs glyphs = Glyphs.Unicode;
    private ScreenLayout layout = ScreenLayout.For(Width, Height);
    private WorkbenchState state = WorkbenchState.Initial(null);
    private string plantFile = string.Empty;
    private int stepCount;

    [GlobalSetup]
    public void Setup()
    {
        plantFile = FlexibleDrivePlant.WriteToTemporaryFolder();
        var worker = new EffectWorker(new SaveContext(() => DateTimeOffset.UnixEpoch, "bench@rig"));
        var (start, effects) = Update.Start(plantFile, null);
        state = RunToCompletion(start, effects, worker);
        if (state.Session is not { Locus: not null } session)
        {
            throw new InvalidOperationException("the benchmark plant did not load and trace: " + state.Message?.Text);
        }

        layout = ScreenLayout.For(Width, Height);
        Console.WriteLine(FormattableString.Invariant(
            $"// {session.Poles.Poles.Length} closed-loop poles, {session.Locus.Branches.Length} branches, plane {layout.Plane.Width}x{layout.Plane.Height}"));
    }

    [GlobalCleanup]
    public void Cleanup() => FlexibleDrivePlant.Delete(plantFile);

    /// <summary>Steps up twenty times, then down twenty times, so every call does the same kind of work.</summary>
    [Benchmark]
    public int OneKeystroke()
    {
        var command = (stepCount++ / StepsEachWay) % 2 == 0 ? Command.StepSweepUp : Command.StepSweepDown;
        state = Update.Apply(state, command).State;
        return RenderScreen(state);
    }

    /// <summary>The text of every pane a step changes; returns the character count so nothing is optimised away.</summary>
    private int RenderScreen(WorkbenchState s)
    {
        var plane = PlanePresenter.Render(s, layout.Plane.Width - 2, layout.Plane.Height - 2, CanvasSymbols.Braille);
        var poles = PoleTablePresenter.Lines(s.Session!.Poles, null, layout.Poles.Width - 2, layout.Poles.Height - 2, glyphs);
        var parameters = ParameterPanelPresenter.Lines(s.Session, layout.Parameters.Width - 2, layout.Parameters.Height - 2, glyphs);
        var status = StatusLinePresenter.Lines(s, layout.Status.Width, layout.Status.Height, glyphs);
        return Length(plane.Lines) + Length(poles) + Length(parameters) + Length(status);
    }

    private static int Length(IEnumerable<string> lines) => lines.Sum(l => l.Length);

    private static WorkbenchState RunToCompletion(WorkbenchState state, ImmutableArray<Effect> effects, EffectWorker worker)
    {
        var queue = new Queue<Effect>(effects);
        while (queue.TryDequeue(out var effect))
        {
            if (worker.Perform(effect) is { } message)
            {
                var (next, more) = Update.Receive(state, message);
                state = next;
                foreach (var e in more)
                {
                    queue.Enqueue(e);
                }
            }
        }

        return state;
    }
}
