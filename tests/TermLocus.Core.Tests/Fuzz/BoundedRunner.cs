using System.Collections.Concurrent;
using System.Diagnostics;

namespace TermLocus.Core.Tests.Fuzz;

/// <summary>
/// Runs each fuzz case on a worker thread with a deliberately small stack (1 MiB, below the 1.5 MiB of a thread-pool
/// thread and the 8 MiB of the main thread), so runaway recursion shows up here first, and waits at most
/// <see cref="FuzzSettings.CaseTimeout"/> for it: a case that takes longer fails the test as a hang. One worker per
/// calling thread; the slowest case seen is kept for the report.
/// </summary>
internal sealed class BoundedRunner : IDisposable
{
    private const int WorkerStackBytes = 1 << 20;

    private readonly BlockingCollection<Action> work = new();
    private readonly Thread worker;
    private readonly SemaphoreSlim done = new(0);
    private Exception? failure;

    public BoundedRunner()
    {
        worker = new Thread(Loop, WorkerStackBytes) { IsBackground = true, Name = "fuzz worker" };
        worker.Start();
    }

    /// <summary>True once a case timed out: the worker is stuck in it and this runner cannot be used again.</summary>
    public bool Stuck { get; private set; }

    /// <summary>Runs <paramref name="action"/> within the time limit and returns how long it took.</summary>
    /// <exception cref="TimeoutException">The case ran past the limit.</exception>
    public TimeSpan Run(Action action, string describe)
    {
        ObjectDisposedException.ThrowIf(Stuck, this);
        var clock = Stopwatch.StartNew();
        failure = null;
        work.Add(() =>
        {
            try
            {
                action();
            }
            catch (Exception e)
            {
                failure = e;
            }
        });
        if (!done.Wait(FuzzSettings.CaseTimeout))
        {
            Stuck = true;
            throw new TimeoutException($"a fuzz case ran past {FuzzSettings.CaseTimeout.TotalSeconds} s: {describe}");
        }

        if (failure is not null)
        {
            throw new InvalidOperationException("fuzz case failed: " + describe, failure);
        }

        return clock.Elapsed;
    }

    public void Dispose()
    {
        work.CompleteAdding();
        if (!Stuck)
        {
            worker.Join();
        }

        done.Dispose();
        work.Dispose();
    }

    private void Loop()
    {
        foreach (var item in work.GetConsumingEnumerable())
        {
            item();
            done.Release();
        }
    }
}
