namespace TermLocus.App.Workbench;

/// <summary>The small dialog asked before saving: a name and a note for the operating point, both with defaults.</summary>
/// <param name="Name">The operating point's name as typed (raw; drawn through SafeText).</param>
/// <param name="Note">Its note as typed (raw).</param>
/// <param name="NoteField">True while the note has the keys, false for the name.</param>
public sealed record SaveOverlay(string Name, string Note, bool NoteField) : Overlay
{
    /// <summary>Longest name or note taken.</summary>
    public const int MaxLength = 120;

    /// <summary>The note saved when none is typed.</summary>
    public const string DefaultNote = "saved from the workbench";

    /// <summary>The text of the field that has the keys.</summary>
    public string Field => NoteField ? Note : Name;

    /// <summary>This dialog with the active field's text replaced.</summary>
    public SaveOverlay WithField(string text) => NoteField ? this with { Note = text } : this with { Name = text };
}
