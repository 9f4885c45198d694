using System.Collections.Immutable;

namespace TermLocus.App.Workbench;

// Switches over our enums list every named value and have no default arm, so a new value breaks the build (CS8509);
// values outside the enum (CS8524) cannot occur.
#pragma warning disable CS8524

/// <summary>
/// The workbench's only way to change state: a command or a message in, the new state and the effects to run out.
/// Pure: no I/O, no clock, no terminal. Heavy results come back later as messages.
/// </summary>
public static class Update
{
    /// <summary>The state after <paramref name="command"/>, and the effects it asks for.</summary>
    public static (WorkbenchState State, ImmutableArray<Effect> Effects) Apply(WorkbenchState state, Command command)
    {
        // A message stays up until the next command, which replaces or clears it.
        var s = state with { Message = null };
        return command switch
        {
            Command.StepSweepDown => Sweeping.Step(s, -1),
            Command.StepSweepUp => Sweeping.Step(s, +1),
            Command.FinerStep => Sweeping.ChangeStep(s, finer: true),
            Command.CoarserStep => Sweeping.ChangeStep(s, finer: false),
            Command.StepBandDown => Banding.Step(s, -1),
            Command.StepBandUp => Banding.Step(s, +1),
            Command.FinerBandStep => Banding.ChangeStep(s, finer: true),
            Command.CoarserBandStep => Banding.ChangeStep(s, finer: false),
            Command.BandToNominal => Banding.ToNominal(s),
            Command.NextVariedParameter => Banding.NextParameter(s),
            Command.JumpToRangeStart => Sweeping.ToRangeEnd(s, atStart: true),
            Command.JumpToRangeEnd => Sweeping.ToRangeEnd(s, atStart: false),
            Command.JumpToRecommended => Sweeping.ToRecommended(s),
            Command.JumpToPreviousBoundary => Sweeping.ToMark(s, -1),
            Command.JumpToNextBoundary => Sweeping.ToMark(s, +1),
            Command.RevertToSavedValue => Sweeping.Revert(s),
            Command.EnterValue => Overlays.OpenValueEntry(s),
            Command.ZoomIn => Viewing.Zoom(s, +1),
            Command.ZoomOut => Viewing.Zoom(s, -1),
            Command.FitView => Done(s with { View = ViewState.Fitted }),
            Command.PanLeft => Viewing.Pan(s, -1, 0),
            Command.PanRight => Viewing.Pan(s, +1, 0),
            Command.PanUp => Viewing.Pan(s, 0, +1),
            Command.PanDown => Viewing.Pan(s, 0, -1),
            Command.ToggleResponse => Viewing.ToggleResponse(s),
            Command.NextPane => s.Overlay is SaveOverlay ? Overlays.Move(s, +1) : Done(s with { Focus = s.Focus == Pane.Plane ? Pane.Poles : Pane.Plane }),
            Command.MoveUp => Overlays.Move(s, -1),
            Command.MoveDown => Overlays.Move(s, +1),
            Command.OpenLibrary => Overlays.OpenLibrary(s),
            Command.ShowHelp => Done(s with { Overlay = new HelpOverlay(0) }),
            Command.SaveOperatingPoint => Saving.OpenDialog(s),
            Command.ReloadFromDisk => FileConflicts.Reload(s),
            Command.SaveUnderAnotherName => FileConflicts.SaveUnderAnotherName(s),
            Command.WriteFileAgain => FileConflicts.WriteAgain(s),
            Command.ApplyRecovery => Recovering.Apply(s),
            Command.DiscardRecovery => Recovering.Discard(s),
            Command.DeleteBackward => Overlays.DeleteBackward(s),
            Command.Confirm => Overlays.Confirm(s),
            Command.Cancel => Overlays.Cancel(s),
            Command.Quit => Saving.Quit(s),
            Command.SaveAndQuit => Saving.Save(s with { Overlay = Overlay.None }, quitAfter: true),
            Command.DiscardAndQuit => (s with { Overlay = Overlay.None }, [new QuitEffect()]),
            Command.QuitNow => Saving.QuitNow(s),
        };
    }

    /// <summary>The state after <paramref name="message"/> arrived, and the effects it asks for.</summary>
    public static (WorkbenchState State, ImmutableArray<Effect> Effects) Receive(WorkbenchState state, Message message) =>
        message switch
        {
            PlantLoaded m => Arrivals.PlantLoaded(state, m),
            PlantLoadFailed m => Arrivals.PlantLoadFailed(state, m),
            LibraryScanned m => Arrivals.LibraryScanned(state, m),
            LocusTraced m => Arrivals.LocusTraced(state, m.Analysis),
            LocusTraceFailed m => Arrivals.LocusTraceFailed(state, m),
            OperatingPointSaved m => Arrivals.Saved(state, m),
            OperatingPointSaveFailed m => Arrivals.SaveFailed(state, m),
            SaveRefused m => FileConflicts.Refused(state, m),
            PlantFileTouched m => FileConflicts.Touched(state, m),
            PlantFileChecked m => FileConflicts.Checked(state, m),
            RecoveryDeleted m => Recovering.Deleted(state, m),
            BandCheck m => Arrivals.BandChecked(state, m),
            Designed m => Done(state.Session is { } session && session.Loaded.Plant.Path == m.PlantPath
                ? state with { Session = session with { Design = m } }
                : state),
            ResponseView m => Arrivals.ResponseSimulated(state, m),
            CharacterTyped m => Overlays.Type(state, m.Character),
            ValuePicked m => Sweeping.Pick(state, m.Value),
            _ => throw new ArgumentOutOfRangeException(nameof(message), message, "unknown message"),
        };

    /// <summary>The state to start from and the effects that fill it: scan the library, open the plant file.</summary>
    /// <param name="plantFile">A plant file to open, or null.</param>
    /// <param name="libraryFolder">The library folder (the plant file's folder, or the folder given), or null.</param>
    public static (WorkbenchState State, ImmutableArray<Effect> Effects) Start(string? plantFile, string? libraryFolder)
    {
        var state = WorkbenchState.Initial(libraryFolder);
        var effects = ImmutableArray.CreateBuilder<Effect>();
        if (libraryFolder is not null)
        {
            effects.Add(new ScanLibraryEffect(libraryFolder));
        }

        if (plantFile is not null)
        {
            effects.Add(new LoadPlantEffect(plantFile));
        }

        return (state, effects.ToImmutable());
    }

    internal static (WorkbenchState State, ImmutableArray<Effect> Effects) Done(WorkbenchState state) => (state, []);

    internal static (WorkbenchState State, ImmutableArray<Effect> Effects) Say(WorkbenchState state, StatusMessage message) =>
        (state with { Message = message }, []);

    internal static (WorkbenchState State, ImmutableArray<Effect> Effects) NoPlant(WorkbenchState state) =>
        Say(state, StatusMessage.Warning("no plant open: o opens the library"));
}
