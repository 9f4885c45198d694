using System.Collections.Immutable;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

/// <summary>Commands that open, drive and close the overlays (help, library, value box) and move in lists.</summary>
internal static class Overlays
{
    /// <summary>Longest text the value box takes.</summary>
    public const int MaxValueLength = 40;

    public static (WorkbenchState, ImmutableArray<Effect>) OpenValueEntry(WorkbenchState s) =>
        s.Session is null ? Update.NoPlant(s) : Update.Done(s with { Overlay = new ValueEntryOverlay(string.Empty, null) });

    public static (WorkbenchState, ImmutableArray<Effect>) OpenLibrary(WorkbenchState s)
    {
        if (s.Library.Folder is null)
        {
            return Update.Say(s, StatusMessage.Warning("no library folder: start termlocus with a folder of plant files"));
        }

        int selected = Math.Max(0, s.Library.Items.IndexOf(s.Library.Items.FirstOrDefault(i => i.Path == s.Session?.Loaded.Plant.Path)!));
        // Scan again: files may have been added or edited since the last look.
        return (s with { Overlay = new LibraryOverlay(selected) }, [new ScanLibraryEffect(s.Library.Folder)]);
    }

    public static (WorkbenchState, ImmutableArray<Effect>) Move(WorkbenchState s, int direction)
    {
        switch (s.Overlay)
        {
            case HelpOverlay help:
                int last = Math.Max(0, HelpPresenter.LineCount - 1);
                return Update.Done(s with { Overlay = new HelpOverlay(Math.Clamp(help.FirstLine + direction, 0, last)) });
            case LibraryOverlay library:
                int items = s.Library.Items.Length;
                return Update.Done(s with { Overlay = new LibraryOverlay(Math.Clamp(library.Selected + direction, 0, Math.Max(0, items - 1))) });
            case SaveOverlay dialog:
                return Update.Done(s with { Overlay = dialog with { NoteField = !dialog.NoteField } });
            case NoOverlay when s.Focus == Pane.Poles && s.Session is { } session:
                int rows = PoleRows.Group(session.Poles.Poles, session.Poles.Plane).Length;
                int selected = Math.Clamp(session.SelectedPole + direction, 0, Math.Max(0, rows - 1));
                return Update.Done(s with { Session = session with { SelectedPole = selected } });
            default:
                return Update.Done(s);
        }
    }

    public static (WorkbenchState, ImmutableArray<Effect>) DeleteBackward(WorkbenchState s) => s.Overlay switch
    {
        ValueEntryOverlay entry when entry.Text.Length > 0 => Update.Done(s with { Overlay = new ValueEntryOverlay(entry.Text[..^1], null) }),
        SaveOverlay dialog when dialog.Field.Length > 0 => Update.Done(s with { Overlay = dialog.WithField(dialog.Field[..^1]) }),
        SaveAsOverlay box when box.Path.Length > 0 => FileConflicts.Edit(s, box, box.Path[..^1]),
        _ => Update.Done(s),
    };

    public static (WorkbenchState, ImmutableArray<Effect>) Type(WorkbenchState s, char character)
    {
        if (s.Overlay is SaveOverlay dialog)
        {
            return char.IsControl(character) || dialog.Field.Length >= SaveOverlay.MaxLength
                ? Update.Done(s)
                : Update.Done(s with { Overlay = dialog.WithField(dialog.Field + character) });
        }

        if (s.Overlay is SaveAsOverlay box)
        {
            return char.IsControl(character) || box.Path.Length >= SaveAsOverlay.MaxLength
                ? Update.Done(s)
                : FileConflicts.Edit(s, box, box.Path + character);
        }

        if (s.Overlay is not ValueEntryOverlay entry || char.IsControl(character) || entry.Text.Length >= MaxValueLength)
        {
            return Update.Done(s);
        }

        return Update.Done(s with { Overlay = new ValueEntryOverlay(entry.Text + character, null) });
    }

    public static (WorkbenchState, ImmutableArray<Effect>) Cancel(WorkbenchState s) => s.Overlay switch
    {
        SaveConflictOverlay or SaveAsOverlay => FileConflicts.Cancel(s),
        RecoveryOverlay recovery => Recovering.Keep(s, recovery),
        _ => Update.Done(s with { Overlay = Overlay.None }),
    };

    public static (WorkbenchState, ImmutableArray<Effect>) Confirm(WorkbenchState s) => s.Overlay switch
    {
        ValueEntryOverlay entry => ConfirmValue(s, entry),
        LibraryOverlay library => OpenSelected(s, library),
        SaveOverlay dialog => Saving.Save(s with { Overlay = Overlay.None }, quitAfter: false, dialog.Name, dialog.Note),
        SaveAsOverlay box => FileConflicts.ConfirmSaveAs(s, box),
        _ => Update.Done(s),
    };

    private static (WorkbenchState, ImmutableArray<Effect>) ConfirmValue(WorkbenchState s, ValueEntryOverlay entry)
    {
        if (s.Session is null)
        {
            return Update.Done(s with { Overlay = Overlay.None });
        }

        if (!NumberText.TryParse(entry.Text, out double value))
        {
            string shown = SafeText.Fit(entry.Text, 20);
            string problem = entry.Text.Trim().Length == 0 ? "type a number, e.g. 1.25 or 4.7e-3" : $"not a number: '{shown}'";
            return Update.Done(s with { Overlay = entry with { Problem = problem } });
        }

        return Sweeping.SetValue(s with { Overlay = Overlay.None }, value, null);
    }

    private static (WorkbenchState, ImmutableArray<Effect>) OpenSelected(WorkbenchState s, LibraryOverlay library)
    {
        if (s.Library.Items.IsEmpty)
        {
            return Update.Say(s, StatusMessage.Warning("no plant files in this folder"));
        }

        var item = s.Library.Items[Math.Clamp(library.Selected, 0, s.Library.Items.Length - 1)];
        if (s.Session is { } session && session.Loaded.Plant.Path == item.Path)
        {
            return Update.Done(s with { Overlay = Overlay.None });
        }

        if (s.Session is { Unsaved: true } unsaved)
        {
            var sweep = unsaved.Sweep;
            return Update.Say(s, StatusMessage.Warning(
                $"{sweep.Name} = {NumberText.Exact(sweep.Value)} is not saved: Esc, then s saves or r reverts it"));
        }

        return (s with
        {
            Overlay = Overlay.None,
            Message = StatusMessage.Info("opening " + SafeText.Visible(item.FileName)),
        }, [new LoadPlantEffect(item.Path)]);
    }
}
