using TermLocus.App.Workbench;

namespace TermLocus.Tui;

/// <summary>Runs the effects <see cref="Update"/> asks for and delivers their messages back on the UI thread.</summary>
internal abstract class EffectRunner
{
    /// <summary>Starts <paramref name="effect"/>; its message, if any, goes to <paramref name="deliver"/>.</summary>
    public abstract void Run(Effect effect, Action<Message> deliver);
}
