using TermLocus.App.Workbench;
using Terminal.Gui.App;

namespace TermLocus.Tui;

/// <summary>
/// Runs slow effects (reading, tracing, checking, simulating, saving) on the thread pool and posts the result back
/// with <see cref="IApplication.Invoke(Action)"/>. Band checks and step responses follow every keystroke, and file
/// checks every write another program makes, so of those only the newest waiting one runs (one of each kind at a
/// time): holding an arrow key or an editor's burst of writes never queues up stale work.
/// The recovery file is written in line: the program is about to exit.
/// </summary>
internal sealed class BackgroundEffectRunner(Action<Action> post, EffectWorker worker) : EffectRunner
{
    private readonly object gate = new();
    private readonly Dictionary<Type, Effect> waiting = [];
    private readonly HashSet<Type> running = [];

    public override void Run(Effect effect, Action<Message> deliver)
    {
        switch (effect)
        {
            case SaveRecoveryEffect:
                if (worker.Perform(effect) is { } failed)
                {
                    deliver(failed);
                }

                return;
            case CheckBandEffect or SimulateResponseEffect or CheckPlantFileEffect:
                RunNewest(effect, deliver);
                return;
            default:
                _ = Task.Run(() => Perform(effect, deliver));
                return;
        }
    }

    private void RunNewest(Effect effect, Action<Message> deliver)
    {
        var kind = effect.GetType();
        lock (gate)
        {
            waiting[kind] = effect;
            if (!running.Add(kind))
            {
                return;
            }
        }

        _ = Task.Run(() =>
        {
            while (true)
            {
                Effect next;
                lock (gate)
                {
                    if (!waiting.Remove(kind, out next!))
                    {
                        running.Remove(kind);
                        return;
                    }
                }

                Perform(next, deliver);
            }
        });
    }

    private void Perform(Effect effect, Action<Message> deliver)
    {
        var message = worker.Perform(effect);
        if (message is not null)
        {
            post(() => deliver(message));
        }
    }
}
