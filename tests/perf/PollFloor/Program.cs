using System.Globalization;

// While idle, Terminal.Gui 2.5's main loop sleeps 40 ms a turn (Application.MaximumIterationsPerSecond = 25, through
// Task.Delay(...).Wait()), and the workbench's input loop (src/TermLocus/Tui/QuietAnsiInput.cs) blocks in poll(2)
// for up to 500 ms, then the toolkit sleeps 20 ms before asking again. This program makes the same waits and nothing
// else, for SECONDS seconds (default 10): its CPU time is the floor that the idle workbench is compared with.
double seconds = args.Length > 0 ? double.Parse(args[0], CultureInfo.InvariantCulture) : 10.0;
using var stop = new CancellationTokenSource();
var input = Task.Run(() =>
{
    while (!stop.IsCancellationRequested)
    {
        try
        {
            Task.Delay(500, stop.Token).Wait(stop.Token);
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
