using System.Globalization;

// While idle, the workbench's main loop blocks for up to 250 ms a turn without spinning (src/TermLocus/Tui/
// MainLoopPacer.cs), and its input loop blocks in poll(2) for up to 500 ms, then the toolkit sleeps 20 ms before
// asking again (src/TermLocus/Tui/QuietAnsiInput.cs). This program makes the same waits and nothing else, for
// SECONDS seconds (default 10): its CPU time is the floor that the idle workbench is compared with.
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
using var turn = new ManualResetEventSlim(initialState: false, spinCount: 0);
var end = DateTime.UtcNow.AddSeconds(seconds);
while (DateTime.UtcNow < end)
{
    turn.Wait(TimeSpan.FromMilliseconds(250));
}

await stop.CancelAsync().ConfigureAwait(false);
await input.ConfigureAwait(false);
