using System.Collections.Immutable;
using System.Globalization;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

/// <summary>
/// The text of the boxes about files: the choice when the plant file changed on disk or is gone, the box for a
/// save under another name, and the choice when a recovery file lies beside an opened plant. Each choice is a line
/// with its keys from <see cref="KeyMap"/>; choices that do not apply are left out.
/// </summary>
public static class FileOverlayPresenter
{
    /// <summary>Lines of the box for a save that cannot go into the plant file as it is.</summary>
    public static ImmutableArray<string> SaveConflict(WorkbenchState state, SaveConflictOverlay conflict, int width, Glyphs glyphs)
    {
        var lines = new List<string>();
        if (state.Session is not { } session)
        {
            return Fit(lines, width, glyphs);
        }

        string file = FileName(session.Loaded.Plant.Path);
        string suggested = FileName(conflict.SuggestedPath);
        string what = conflict.Reason == FileOnDisk.Missing
            ? $"{file} is gone from disk: another program deleted or moved it. Nothing was written."
            : $"{file} changed on disk since it was loaded: another program wrote or replaced it. Nothing was written.";
        lines.AddRange(HelpPresenter.Wrap(what, Math.Max(1, width)));
        lines.Add(ValueWords(session.Sweep));
        lines.Add(string.Empty);
        var sweep = session.Sweep;
        string value = $"{sweep.Name} = {NumberText.Exact(sweep.Value)}";
        if (conflict.Reason == FileOnDisk.Changed)
        {
            lines.Add(Choice(Command.ReloadFromDisk, Scope.SaveConflict, $"read it again from disk; {value} stays, unsaved", glyphs));
        }

        lines.Add(Choice(Command.SaveUnderAnotherName, Scope.SaveConflict, $"save under another name ({suggested} or one you type)", glyphs));
        if (conflict.Reason == FileOnDisk.Missing)
        {
            lines.Add(Choice(Command.WriteFileAgain, Scope.SaveConflict, $"write {file} again where it was", glyphs));
        }

        lines.Add(Choice(Command.Cancel, Scope.SaveConflict, "cancel", glyphs));
        return Fit(lines, width, glyphs);
    }

    /// <summary>Lines of the box to type the new file's path; a long path shows its end.</summary>
    public static ImmutableArray<string> SaveAs(WorkbenchState state, SaveAsOverlay box, int width, Glyphs glyphs)
    {
        var lines = new List<string>();
        if (state.Session is { } session)
        {
            var sweep = session.Sweep;
            lines.AddRange(HelpPresenter.Wrap(
                $"Save {sweep.Name} = {NumberText.Exact(sweep.Value)} as a new plant file: {FileName(session.Loaded.Plant.Path)} " +
                "as loaded, with this value and an operating point. An existing file is never replaced.",
                Math.Max(1, width)));
        }

        lines.Add("Path (a relative one starts in the folder termlocus was started in):");
        string shown = SafeText.Visible(box.Path) + "_";
        int room = Math.Max(4, width - 2);
        lines.Add("> " + (TextWidth.Of(shown) > room ? glyphs.Ellipsis + shown[^(room - 1)..] : shown));
        lines.Add(box.Problem is null ? string.Empty : glyphs.Violated + " " + box.Problem);
        lines.Add(KeyHints.Line(state with { Overlay = box }, width, glyphs));
        return Fit(lines, width, glyphs);
    }

    /// <summary>Lines of the box offering a recovery file found beside the opened plant.</summary>
    public static ImmutableArray<string> Recovery(WorkbenchState state, RecoveryOverlay overlay, int width, Glyphs glyphs)
    {
        var file = overlay.File;
        string plant = state.Session is { } session ? FileName(session.Loaded.Plant.Path) : "the plant file";
        var lines = new List<string>();
        lines.AddRange(HelpPresenter.Wrap(
            $"{FileName(file.Path)} lies beside {plant}: termlocus kept an unsaved value there when it last ended abruptly.",
            Math.Max(1, width)));
        lines.AddRange(HelpPresenter.Wrap(WhenWords(file, glyphs), Math.Max(1, width)));
        if (file.CanApply && state.Session is { Sweep: var sweep })
        {
            string value = $"{file.Parameter} = {NumberText.Exact(file.Value!.Value)}";
            bool same = file.Value == sweep.SavedValue;
            lines.Add(same
                ? $"It holds {value}, the value {plant} already has: nothing to apply."
                : $"It holds {value}; {plant} has {NumberText.Exact(sweep.SavedValue)}.");
            lines.Add(string.Empty);
            if (!same)
            {
                lines.Add(Choice(Command.ApplyRecovery, Scope.Recovery, $"apply {value} as an unsaved value (s then saves it)", glyphs));
            }
        }
        else
        {
            lines.AddRange(HelpPresenter.Wrap(
                $"{glyphs.Violated} It cannot be applied: {SafeText.Visible(file.Problem ?? "it holds no value")}", Math.Max(1, width)).Take(3));
            lines.Add(string.Empty);
        }

        lines.Add(Choice(Command.DiscardRecovery, Scope.Recovery, "discard it: delete the recovery file", glyphs));
        lines.Add(Choice(Command.Cancel, Scope.Recovery, "keep it for later (offered again next time)", glyphs));
        return Fit(lines, width, glyphs);
    }

    /// <summary>"! plant.toml changed on disk: Enter asks what to do", or null while it is as loaded.</summary>
    public static string? DiskWarning(PlantSession session, Glyphs glyphs) => session.Disk switch
    {
        FileOnDisk.Changed => $"{glyphs.Violated} {FileName(session.Loaded.Plant.Path)} changed on disk: Enter asks what to do",
        FileOnDisk.Missing => $"{glyphs.Violated} {FileName(session.Loaded.Plant.Path)} is gone from disk: Enter asks what to do",
        _ => null,
    };

    // When it was written, against the plant file's last change: a newer plant file may hold newer values.
    private static string WhenWords(RecoveryFile file, Glyphs glyphs)
    {
        if (file.WrittenUtc == DateTimeOffset.MinValue)
        {
            return string.Empty;
        }

        string written = "written " + Time(file.WrittenUtc);
        return file.Stale
            ? $"{glyphs.Violated} Older than the plant file: {written}, the plant file changed {Time(file.PlantChangedUtc)}; its value may be out of date."
            : $"It was {written}, after the plant file last changed.";
    }

    private static string Time(DateTimeOffset t) => t.UtcDateTime.ToString("yyyy-MM-dd HH:mm 'UTC'", CultureInfo.InvariantCulture);

    private static string ValueWords(SweepState sweep) => sweep.Unsaved
        ? $"{sweep.Name} = {NumberText.Exact(sweep.Value)} is not saved (the file had {NumberText.Exact(sweep.SavedValue)})."
        : $"{sweep.Name} = {NumberText.Exact(sweep.Value)}, the value the file had.";

    // "  r    read it again ...": the command's keys from the one key table, then the words.
    private static string Choice(Command command, Scope scope, string words, Glyphs glyphs)
    {
        string keys = string.Join("/", KeyMap.KeysFor(command, scope).Select(k => k.Name(glyphs)));
        return "  " + TextWidth.PadRight(keys, 6) + " " + words;
    }

    private static string FileName(string path) => SafeText.Visible(Path.GetFileName(path));

    private static ImmutableArray<string> Fit(IEnumerable<string> lines, int width, Glyphs glyphs) =>
        lines.Select(l => TextWidth.PadRight(SafeText.Fit(l, width, glyphs.Ellipsis), width)).ToImmutableArray();
}
