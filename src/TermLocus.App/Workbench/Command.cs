namespace TermLocus.App.Workbench;

/// <summary>
/// Everything a key can ask the workbench to do. <see cref="Update.Apply"/> switches over this enum without a
/// default arm, so a new command does not build until it is handled; the key table tests demand a binding for each.
/// </summary>
public enum Command
{
    /// <summary>Lower the swept value by one step.</summary>
    StepSweepDown,

    /// <summary>Raise the swept value by one step.</summary>
    StepSweepUp,

    /// <summary>Make the step one notch (1-2-5 series) smaller.</summary>
    FinerStep,

    /// <summary>Make the step one notch (1-2-5 series) larger.</summary>
    CoarserStep,

    /// <summary>Move the varied (toleranced) parameter one band step down (a tenth of its band at first).</summary>
    StepBandDown,

    /// <summary>Move the varied parameter one band step up.</summary>
    StepBandUp,

    /// <summary>Make the band step finer: the band split in more steps (2, 5, 10, 20, 50, 100).</summary>
    FinerBandStep,

    /// <summary>Make the band step coarser: the band split in fewer steps.</summary>
    CoarserBandStep,

    /// <summary>Put the varied parameter back to its nominal value.</summary>
    BandToNominal,

    /// <summary>Vary the next toleranced parameter (the one varied so far goes back to nominal).</summary>
    NextVariedParameter,

    /// <summary>Set the swept value to the start of its range.</summary>
    JumpToRangeStart,

    /// <summary>Set the swept value to the end of its range.</summary>
    JumpToRangeEnd,

    /// <summary>Open the box to type an exact swept value.</summary>
    EnterValue,

    /// <summary>Set the swept value to the recommended one of the robust design.</summary>
    JumpToRecommended,

    /// <summary>Set the swept value to the nearest spec boundary or stability crossing below it.</summary>
    JumpToPreviousBoundary,

    /// <summary>Set the swept value to the nearest spec boundary or stability crossing above it.</summary>
    JumpToNextBoundary,

    /// <summary>Show a smaller part of the s-plane, larger.</summary>
    ZoomIn,

    /// <summary>Show a larger part of the s-plane.</summary>
    ZoomOut,

    /// <summary>Fit the view to the whole locus.</summary>
    FitView,

    /// <summary>Move the view left (towards more negative real parts).</summary>
    PanLeft,

    /// <summary>Move the view right.</summary>
    PanRight,

    /// <summary>Move the view up (towards larger imaginary parts).</summary>
    PanUp,

    /// <summary>Move the view down.</summary>
    PanDown,

    /// <summary>Show the closed-loop step response (in place of the plane; beside it in roomy layouts), or hide it.</summary>
    ToggleResponse,

    /// <summary>Move keyboard focus to the next pane.</summary>
    NextPane,

    /// <summary>Move up in a list: the library, the pole table, the help text.</summary>
    MoveUp,

    /// <summary>Move down in a list.</summary>
    MoveDown,

    /// <summary>Open the plant library.</summary>
    OpenLibrary,

    /// <summary>Show the help (the key table and the caution).</summary>
    ShowHelp,

    /// <summary>Save the swept value into the plant file as an operating point.</summary>
    SaveOperatingPoint,

    /// <summary>Put the swept value back to the value saved in the plant file.</summary>
    RevertToSavedValue,

    /// <summary>Answer to a refused save: read the plant file again from disk, keeping the swept value.</summary>
    ReloadFromDisk,

    /// <summary>Answer to a refused save: save the plant with the value under another file name.</summary>
    SaveUnderAnotherName,

    /// <summary>Answer to a save refused because the plant file is gone: write it again at the same path.</summary>
    WriteFileAgain,

    /// <summary>Answer to a recovery file found on opening: take its value as an unsaved value.</summary>
    ApplyRecovery,

    /// <summary>Answer to a recovery file found on opening: delete it.</summary>
    DiscardRecovery,

    /// <summary>Delete the last typed character in the value box.</summary>
    DeleteBackward,

    /// <summary>Accept: open the selected plant, set the typed value.</summary>
    Confirm,

    /// <summary>Close the overlay on top; on the main screen, only clear the message (never quits).</summary>
    Cancel,

    /// <summary>Quit, asking first when the chosen value is unsaved.</summary>
    Quit,

    /// <summary>Answer to the quit question: save the value, then quit.</summary>
    SaveAndQuit,

    /// <summary>Answer to the quit question: quit without saving.</summary>
    DiscardAndQuit,

    /// <summary>Quit at once (Ctrl+C); an unsaved value goes to the recovery file beside the plant.</summary>
    QuitNow,
}
