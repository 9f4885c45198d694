using System.Diagnostics;
using System.Globalization;

namespace TermLocus.Core.Tests.Fuzz;

/// <summary>
/// One fuzz test's run: every case goes through a <see cref="BoundedRunner"/> of the calling thread (so each is
/// bounded in time and stack), and the session counts cases and keeps the slowest one for the report.
/// </summary>
internal sealed class FuzzSession : IDisposable
{
    private readonly string name;
    private readonly ThreadLocal<BoundedRunner> runners = new(() => new BoundedRunner(), trackAllValues: true);
    private readonly Stopwatch clock = Stopwatch.StartNew();
    private readonly Lock gate = new();
    private long cases;
    private TimeSpan slowest;
    private string slowestCase = "";

    public FuzzSession(string name) => this.name = name;

    public long Cases => Interlocked.Read(ref cases);

    /// <summary>Runs one case; <paramref name="describe"/> is only called when the case fails or is the slowest.</summary>
    public void Run(Action action, Func<string> describe)
    {
        var runner = runners.Value!;
        if (runner.Stuck)
        {
            runners.Value = runner = new BoundedRunner();
        }

        TimeSpan took;
        try
        {
            took = runner.Run(action, "");
        }
        catch (Exception e) when (e is TimeoutException or InvalidOperationException)
        {
            var cause = e.InnerException ?? e;
            throw new FuzzCaseException(
                $"{e.Message} {Shorten(describe())} => {cause.GetType().Name}: {Shorten(cause.Message)} at {Shorten(cause.StackTrace ?? "")}", cause);
        }

        Interlocked.Increment(ref cases);
        if (took > slowest)
        {
            lock (gate)
            {
                if (took > slowest)
                {
                    slowest = took;
                    slowestCase = Shorten(describe());
                }
            }
        }
    }

    /// <summary>The figures of the run, one line.</summary>
    public string Summary() => string.Create(CultureInfo.InvariantCulture,
        $"{name}: {Cases} cases in {clock.Elapsed.TotalSeconds:F1} s; slowest {slowest.TotalMilliseconds:F1} ms: {slowestCase}");

    public void Dispose()
    {
        FuzzSettings.Report(Summary());
        foreach (var runner in runners.Values)
        {
            runner.Dispose();
        }

        runners.Dispose();
    }

    /// <summary>A case for a message: control characters made visible and the middle of long text cut.</summary>
    public static string Shorten(string text)
    {
        const int keep = 300;
        var visible = string.Concat(text.Select(c => char.IsControl(c) ? $"\\u{(int)c:X4}" : c.ToString()));
        return visible.Length <= 2 * keep ? visible : $"{visible[..keep]} …[{visible.Length - (2 * keep)} chars]… {visible[^keep..]}";
    }
}
