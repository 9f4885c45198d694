using System.Collections.Immutable;
using TermLocus.App.Workbench;

namespace TermLocus.Tui;

/// <summary>
/// Holds the one current <see cref="WorkbenchState"/>, feeds commands and messages through <see cref="Update"/>, runs
/// the effects and tells the screen when the state changed. Quitting is an effect like any other.
/// </summary>
internal sealed class WorkbenchController(WorkbenchState initial, EffectRunner runner, Action quit)
{
    /// <summary>The current state.</summary>
    public WorkbenchState State { get; private set; } = initial;

    /// <summary>Raised with (before, after) whenever the state changes.</summary>
    public event Action<WorkbenchState, WorkbenchState>? StateChanged;

    /// <summary>True once a quit effect has run.</summary>
    public bool QuitRequested { get; private set; }

    /// <summary>Runs the start-up effects (scan the library, open the plant).</summary>
    public void Start(ImmutableArray<Effect> effects) => RunEffects(effects);

    /// <summary>Applies a command.</summary>
    public void Dispatch(Command command) => Commit(Update.Apply(State, command));

    /// <summary>Applies a message (an effect's outcome, a typed character, a click).</summary>
    public void Receive(Message message) => Commit(Update.Receive(State, message));

    /// <summary>
    /// For a signal or a dead terminal: write an unsaved value to the recovery file, then quit. Same path as Ctrl+C.
    /// </summary>
    public void EmergencyExit()
    {
        if (!QuitRequested)
        {
            Dispatch(Command.QuitNow);
        }
    }

    private void Commit((WorkbenchState State, ImmutableArray<Effect> Effects) result)
    {
        var before = State;
        State = result.State;
        if (!ReferenceEquals(before, State) && before != State)
        {
            StateChanged?.Invoke(before, State);
        }

        RunEffects(result.Effects);
    }

    private void RunEffects(ImmutableArray<Effect> effects)
    {
        foreach (var effect in effects)
        {
            if (effect is QuitEffect)
            {
                QuitRequested = true;
                quit();
                return;
            }

            runner.Run(effect, Receive);
        }
    }
}
