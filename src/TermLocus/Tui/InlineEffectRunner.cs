using TermLocus.App.Workbench;

namespace TermLocus.Tui;

/// <summary>Runs every effect at once on the calling thread (screen tests, scripted runs).</summary>
internal sealed class InlineEffectRunner(Func<Effect, Message?> perform) : EffectRunner
{
    public override void Run(Effect effect, Action<Message> deliver)
    {
        if (perform(effect) is { } message)
        {
            deliver(message);
        }
    }
}
