using TermLocus.App.Workbench;
using Terminal.Gui.App;

namespace TermLocus.Tui;

/// <summary>
/// Runs slow effects (reading, tracing, saving) on the thread pool and posts the result back with
/// <see cref="IApplication.Invoke(Action)"/>. The recovery file is written in line: the program is about to exit.
/// </summary>
internal sealed class BackgroundEffectRunner(IApplication app, EffectWorker worker) : EffectRunner
{
    public override void Run(Effect effect, Action<Message> deliver)
    {
        if (effect is SaveRecoveryEffect)
        {
            if (worker.Perform(effect) is { } failed)
            {
                deliver(failed);
            }

            return;
        }

        _ = Task.Run(() =>
        {
            var message = worker.Perform(effect);
            if (message is not null)
            {
                app.Invoke(() => deliver(message));
            }
        });
    }
}
