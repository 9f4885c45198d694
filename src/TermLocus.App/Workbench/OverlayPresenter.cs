using System.Collections.Immutable;
using TermLocus.App.Canvas;
using TermLocus.App.Plot;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

/// <summary>The text of the small boxes and screens: the value box, the quit question, the too-small screen, the legend.</summary>
public static class OverlayPresenter
{
    /// <summary>The value box: what to type, the text so far with a cursor, the last problem.</summary>
    public static ImmutableArray<string> ValueEntry(WorkbenchState state, ValueEntryOverlay entry, int width, Glyphs glyphs)
    {
        var lines = new List<string>();
        if (state.Session is { } session)
        {
            var sweep = session.Sweep;
            lines.Add($"New value for {sweep.Name}" + (sweep.Unit.Length > 0 ? $" ({SafeText.Visible(sweep.Unit)})" : string.Empty));
            lines.Add($"range {NumberText.Exact(sweep.Range.Low)} to {NumberText.Exact(sweep.Range.High)}, now {NumberText.Exact(sweep.Value)}");
        }

        lines.Add(string.Empty);
        lines.Add("> " + SafeText.Visible(entry.Text) + "_");
        lines.Add(entry.Problem is null ? string.Empty : glyphs.Violated + " " + entry.Problem);
        return Fit(lines, width, glyphs);
    }

    /// <summary>The quit question: which value is unsaved, how it fares, and the three answers.</summary>
    public static ImmutableArray<string> QuitConfirm(WorkbenchState state, int width, Glyphs glyphs) =>
        Fit(QuitConfirmText(state, width, glyphs), width, glyphs);

    private static List<string> QuitConfirmText(WorkbenchState state, int width, Glyphs glyphs)
    {
        var lines = new List<string>();
        if (state.Session is { } session)
        {
            var sweep = session.Sweep;
            string file = SafeText.Visible(Path.GetFileName(session.Loaded.Plant.Path));
            lines.Add($"{sweep.Name} = {NumberText.Exact(sweep.Value)} is not saved in {file}");
            lines.Add($"(the file has {NumberText.Exact(sweep.SavedValue)}); {VerdictWords(session, glyphs)}");
        }

        lines.Add(string.Empty);
        lines.Add(KeyHints.Line(state with { Overlay = new QuitConfirmOverlay() }, int.MaxValue, glyphs));
        return lines;
    }

    /// <summary>The save dialog: what is saved where, its band verdict, the name and note fields, the keys.</summary>
    public static ImmutableArray<string> SaveDialog(WorkbenchState state, SaveOverlay dialog, int width, Glyphs glyphs)
    {
        var lines = new List<string>();
        if (state.Session is { } session)
        {
            var sweep = session.Sweep;
            string file = SafeText.Visible(Path.GetFileName(session.Loaded.Plant.Path));
            lines.Add($"Save {sweep.Name} = {NumberText.Exact(sweep.Value)} into {file} as an operating point");
            var warning = FileOverlayPresenter.DiskWarning(session, glyphs);
            lines.AddRange(HelpPresenter.Wrap(VerdictWords(session, glyphs), Math.Max(1, width)).Take(warning is null ? 2 : 1));
            if (warning is not null)
            {
                lines.Add(warning);
            }
        }

        lines.Add(string.Empty);
        lines.Add(Field("name", dialog.Name, !dialog.NoteField, width, glyphs));
        lines.Add(Field("note", dialog.Note, dialog.NoteField, width, glyphs));
        lines.Add(string.Empty);
        lines.Add(KeyHints.Line(state with { Overlay = dialog }, width, glyphs));
        return Fit(lines, width, glyphs);
    }

    // "▸ name: Kp = 3.2_": the field with the keys is marked and shows the cursor; a long text shows its end.
    private static string Field(string label, string text, bool active, int width, Glyphs g)
    {
        string shown = SafeText.Visible(text) + (active ? "_" : string.Empty);
        int room = Math.Max(4, width - label.Length - 4);
        if (TextWidth.Of(shown) > room)
        {
            shown = g.Ellipsis + shown[^(room - 1)..];
        }

        return $"{(active ? g.Selected : " ")} {label}: {shown}";
    }

    // The band verdict the save would write, or that it is still being checked.
    private static string VerdictWords(PlantSession session, Glyphs g)
    {
        var check = session.Check ?? session.Checks.Find(session.Sweep.Value);
        if (session.Loaded.Model is null)
        {
            return "it " + SpecWording.Verdict(session.Poles, g) + ".";
        }

        return check is not null && check.SweptValue == session.Sweep.Value
            ? "band: " + SaveVerdict.Of(check, g)
            : "band: still being checked" + g.Ellipsis;
    }

    /// <summary>The whole screen when the terminal is below the minimum size; q (and the quit question) still work.</summary>
    public static ImmutableArray<string> TooSmall(WorkbenchState state, int width, int height, Glyphs glyphs)
    {
        var lines = new List<string>
        {
            $"TermLocus needs at least {ScreenLayout.MinimumWidth}x{ScreenLayout.MinimumHeight}, have {width}x{height}.",
            "Make the window larger, or press q to quit.",
        };
        if (state.Overlay is QuitConfirmOverlay)
        {
            lines.Add(string.Empty);
            lines.AddRange(QuitConfirmText(state, width, glyphs));
        }

        var wrapped = lines.SelectMany(l => l.Length == 0 ? [string.Empty] : HelpPresenter.Wrap(SafeText.Visible(l), Math.Max(1, width)));
        return wrapped.Take(Math.Max(0, height)).Select(l => TextWidth.PadRight(TextWidth.Cut(l, width), width)).ToImmutableArray();
    }

    /// <summary>The key to the plane's marks, one item a line (for the roomy side column).</summary>
    public static ImmutableArray<string> LegendLines(CanvasSymbols symbols, int width) =>
        PlaneLegend.Line(symbols).Split("  ", StringSplitOptions.RemoveEmptyEntries)
            .Select(item => TextWidth.PadRight(TextWidth.Cut(item, width), width))
            .ToImmutableArray();

    private static ImmutableArray<string> Fit(IEnumerable<string> lines, int width, Glyphs glyphs) =>
        lines.Select(l => TextWidth.PadRight(SafeText.Fit(l, width, glyphs.Ellipsis), width)).ToImmutableArray();
}
