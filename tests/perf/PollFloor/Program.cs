using System.Globalization;

// While idle, Terminal.Gui 2.5's main loop sleeps 40 ms a turn (Application.MaximumIterationsPerSecond = 25, through
// Task.Delay(...).Wait()) and its input loop, on a thread-pool thread, polls the terminal and sleeps 20 ms. This
// program makes the same two waits and nothing else, for SECONDS seconds (default 10): its CPU time is the floor
// that the idle workbench is compared with.
double seconds = args.Length > 0 ? double.Parse(args[0], CultureInfo.InvariantCulture) : 10.0;
using var stop = new CancellationTokenSource();
var input = Task.Run(() =>
{
    while (!stop.IsCancellationRequested)
    {
        try
        {
            Task.Delay(20, stop.Token).Wait(stop.Token);
        }
        catch (OperationCanceledException)
        {
            // Asked to stop.
        }
    }
});
var end = DateTime.UtcNow.AddSeconds(seconds);
while (DateTime.UtcNow < end)
{
    Task.Delay(40).Wait();
}

await stop.CancelAsync().ConfigureAwait(false);
await input.ConfigureAwait(false);
