using TermLocus.App.Canvas;
using TermLocus.App.Text;
using TermLocus.App.Workbench;

namespace TermLocus.Tui;

/// <summary>
/// Presenter lines with their tones, pane by pane. The tones follow the presenters' own marks (the selection glyph in
/// the first column, the violation glyph in the second, the verdict glyph), so colour only repeats what the text says.
/// </summary>
internal static class PaneContent
{
    public static IReadOnlyList<StyledLine> Parameters(WorkbenchState state, int width, int height, Glyphs g) =>
        ParameterPanelPresenter.Lines(state.Session, width, height, g)
            .Select((line, i) => new StyledLine(line, i switch
            {
                0 => Tone.Heading,
                3 or 4 when line.StartsWith(g.Violated, StringComparison.Ordinal) => Tone.Warning,
                _ => Tone.Normal,
            }))
            .ToList();

    public static IReadOnlyList<StyledLine> Poles(WorkbenchState state, int width, int height, Glyphs g)
    {
        if (state.Session is not { } session)
        {
            return [new StyledLine(TextWidth.PadRight("no plant open", width), Tone.Dim)];
        }

        int? selected = state.Focus == Pane.Poles && state.Overlay is NoOverlay ? session.SelectedPole : null;
        var lines = PoleTablePresenter.Lines(session.Poles, selected, width, height, g);
        return lines.Select((line, i) => new StyledLine(line, i == 0 ? Tone.Heading : RowTone(line, g))).ToList();
    }

    public static IReadOnlyList<StyledLine> Response(WorkbenchState state, int width, int height, CanvasSymbols symbols, Glyphs g) =>
        ResponsePanePresenter.Lines(state.Session, width, height, symbols, g)
            .Select(l => new StyledLine(l, l.Contains(g.Violated + " ", StringComparison.Ordinal) ? Tone.Bad : Tone.Normal))
            .ToList();

    public static IReadOnlyList<StyledLine> Status(WorkbenchState state, int width, Glyphs g)
    {
        var lines = StatusLinePresenter.Lines(state, width, 3, g);
        Tone verdict = state.Session is null ? Tone.Dim : lines[0].StartsWith(g.Violated, StringComparison.Ordinal) ? Tone.Bad : Tone.Good;
        Tone message = state.Message?.Kind switch
        {
            MessageKind.Error => Tone.Error,
            MessageKind.Warning => Tone.Warning,
            _ => Tone.Normal,
        };
        return [new StyledLine(lines[0], verdict), new StyledLine(lines[1], message), new StyledLine(lines[2], Tone.Dim)];
    }

    public static IReadOnlyList<StyledLine> Help(HelpOverlay help, int width, int height, Glyphs g)
    {
        var all = HelpPresenter.Lines(g, width);
        int first = Math.Clamp(help.FirstLine, 0, Math.Max(0, all.Length - height));
        return all.Skip(first).Take(height)
            .Select(l => new StyledLine(TextWidth.PadRight(l, width), l.Length > 0 && l[0] != ' ' ? Tone.Heading : Tone.Normal))
            .ToList();
    }

    public static IReadOnlyList<StyledLine> Library(WorkbenchState state, int? selected, int width, int height, Glyphs g)
    {
        var lines = LibraryPresenter.Lines(state.Library, selected ?? -1, state.Session?.Loaded.Plant.Path, width, height, g);
        return lines.Select((line, i) => new StyledLine(line, i == 0 ? Tone.Heading : RowTone(line, g))).ToList();
    }

    public static IReadOnlyList<StyledLine> ValueEntry(WorkbenchState state, ValueEntryOverlay entry, int width, Glyphs g) =>
        OverlayPresenter.ValueEntry(state, entry, width, g)
            .Select(l => new StyledLine(l, l.StartsWith(g.Violated, StringComparison.Ordinal) ? Tone.Bad : Tone.Normal))
            .ToList();

    public static IReadOnlyList<StyledLine> SaveDialog(WorkbenchState state, SaveOverlay dialog, int width, Glyphs g) =>
        OverlayPresenter.SaveDialog(state, dialog, width, g)
            .Select(l => new StyledLine(l, l.StartsWith(g.Selected, StringComparison.Ordinal) ? Tone.Heading
                : l.StartsWith(g.Violated + " ", StringComparison.Ordinal) ? Tone.Warning : Tone.Normal))
            .ToList();

    /// <summary>Lines whose warning mark starts them (after any indent) drawn as warnings, the rest plain.</summary>
    public static IReadOnlyList<StyledLine> Marked(IEnumerable<string> lines, Glyphs g) =>
        lines.Select(l => new StyledLine(l, l.TrimStart().StartsWith(g.Violated + " ", StringComparison.Ordinal) ? Tone.Warning : Tone.Normal)).ToList();

    public static IReadOnlyList<StyledLine> QuitConfirm(WorkbenchState state, int width, Glyphs g) =>
        OverlayPresenter.QuitConfirm(state, width, g).Select(l => new StyledLine(l, Tone.Normal)).ToList();

    public static IReadOnlyList<StyledLine> TooSmall(WorkbenchState state, int width, int height, Glyphs g) =>
        OverlayPresenter.TooSmall(state, width, height, g).Select(l => new StyledLine(l, Tone.Normal)).ToList();

    public static IReadOnlyList<StyledLine> Legend(CanvasSymbols symbols, int width) =>
        OverlayPresenter.LegendLines(symbols, width).Select(l => new StyledLine(l, Tone.Normal)).ToList();

    private static Tone RowTone(string line, Glyphs g)
    {
        bool selected = line.StartsWith(g.Selected, StringComparison.Ordinal);
        string rest = selected ? line[g.Selected.Length..] : line.Length > 0 ? line[1..] : line;
        bool bad = rest.StartsWith(g.Violated, StringComparison.Ordinal) || rest.TrimStart().StartsWith(g.Violated, StringComparison.Ordinal);
        return (selected, bad) switch
        {
            (true, true) => Tone.SelectedBad,
            (true, false) => Tone.Selected,
            (false, true) => Tone.Bad,
            _ => line.StartsWith("  ", StringComparison.Ordinal) && line.Contains("more (", StringComparison.Ordinal) ? Tone.Dim : Tone.Normal,
        };
    }
}
