using TermLocus.App.Canvas;
using TermLocus.App.Text;
using TermLocus.App.Workbench;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using Attr = Terminal.Gui.Drawing.Attribute;
using Glyphs = TermLocus.App.Text.Glyphs;

namespace TermLocus.Tui;

/// <summary>
/// The workbench's one screen: the panes placed by <see cref="ScreenLayout"/>, one overlay box for help, library,
/// value entry and the quit question, and a message screen below the minimum size. It only draws the current state,
/// and asks Terminal.Gui to redraw only the panes whose inputs changed.
/// </summary>
internal sealed class WorkbenchScreen : Runnable
{
    private readonly WorkbenchController controller;
    private readonly Glyphs glyphs;
    private readonly PlanePane plane;
    private readonly TextPane parameters;
    private readonly TextPane legend;
    private readonly TextPane library;
    private readonly TextPane poles;
    private readonly TextPane status;
    private readonly TextPane overlay;
    private readonly TextPane tooSmall;
    private readonly TextPane response;
    private ScreenLayout layout = ScreenLayout.For(0, 0);

    public WorkbenchScreen(WorkbenchController controller, Palette palette, CanvasSymbols symbols)
    {
        this.controller = controller;
        glyphs = symbols == CanvasSymbols.Braille ? Glyphs.Unicode : Glyphs.Ascii;
        Width = Dim.Fill();
        Height = Dim.Fill();
        BorderStyle = LineStyle.None;

        // Nothing on this screen takes focus (keys arrive through KeyRouter). With a focusable top view Terminal.Gui
        // re-sends "hide cursor, go home" on every loop turn, about 300 bytes a second while idle.
        CanFocus = false;
        SetScheme(new Scheme(new Attr(Color.None, Color.None)));

        var frame = symbols == CanvasSymbols.Braille ? FrameGlyphs.Unicode : FrameGlyphs.Ascii;
        plane = new PlanePane(() => controller.State, controller.Receive, palette, symbols, frame);
        parameters = new TextPane(palette, frame, (w, h) => PaneContent.Parameters(State, w, h, glyphs)) { Heading = "parameter" };
        legend = new TextPane(palette, frame, (w, _) => PaneContent.Legend(symbols, w)) { Heading = "legend" };
        library = new TextPane(palette, frame, (w, h) => PaneContent.Library(State, null, w, h, glyphs)) { Heading = "library" };
        poles = new TextPane(palette, frame, (w, h) => PaneContent.Poles(State, w, h, glyphs));
        status = new TextPane(palette, null, (w, _) => PaneContent.Status(State, w, glyphs));
        overlay = new TextPane(palette, frame, OverlayContent);
        tooSmall = new TextPane(palette, null, (w, h) => PaneContent.TooSmall(State, w, h, glyphs));
        response = new TextPane(palette, frame, (w, h) => PaneContent.Response(State, w, h, symbols, glyphs));
        Add(plane, response, parameters, legend, library, poles, status, overlay, tooSmall);
        controller.StateChanged += OnStateChanged;
        UpdateTitles(State);
    }

    private WorkbenchState State => controller.State;

    /// <summary>How many times the s-plane has been drawn.</summary>
    public int PlaneDrawCount => plane.DrawCount;

    /// <summary>The layout in use (for tests and the mouse).</summary>
    public ScreenLayout CurrentLayout => layout;

    // When the screen itself is cleared, every pane must write all its cells again.
    protected override bool OnClearingViewport()
    {
        plane.Invalidate();
        foreach (var pane in new[] { parameters, legend, library, poles, status, overlay, tooSmall, response })
        {
            pane.Invalidate();
        }

        return base.OnClearingViewport();
    }

    protected override void OnSubViewLayout(LayoutEventArgs args)
    {
        var next = ScreenLayout.For(Viewport.Width, Viewport.Height, State.ShowsResponse);
        if (next != layout)
        {
            layout = next;
            Place();
        }

        base.OnSubViewLayout(args);
    }

    private static void PlaceAt(View view, Box box)
    {
        view.Visible = !box.IsEmpty;
        if (!box.IsEmpty)
        {
            view.X = box.X;
            view.Y = box.Y;
            view.Width = box.Width;
            view.Height = box.Height;
        }
    }

    private void Place()
    {
        bool small = layout.Mode == LayoutMode.TooSmall;
        PlaceAt(plane, layout.Plane);
        PlaceAt(response, layout.Response);
        PlaceAt(parameters, layout.Parameters);
        PlaceAt(legend, layout.Legend);
        PlaceAt(library, layout.Library);
        PlaceAt(poles, layout.Poles);
        PlaceAt(status, layout.Status);
        PlaceAt(tooSmall, small ? layout.Screen : Box.Empty);
        plane.ShowsLegend = layout.Mode == LayoutMode.Compact;
        PlaceOverlay(State);

        // Panes moved or changed size: none may trust what it remembers of the screen.
        plane.Invalidate();
        foreach (var pane in new[] { parameters, legend, library, poles, status, overlay, tooSmall, response })
        {
            pane.Invalidate();
        }

        RedrawAll();
    }

    private void PlaceOverlay(WorkbenchState state)
    {
        if (layout.Mode == LayoutMode.TooSmall)
        {
            PlaceAt(overlay, Box.Empty);
            return;
        }

        var screen = layout.Screen;
        Box box = state.Overlay switch
        {
            HelpOverlay => layout.OverlayBox(86, screen.Height),
            LibraryOverlay => layout.OverlayBox(100, state.Library.Items.Length + 4),
            ValueEntryOverlay => layout.OverlayBox(52, 7),
            SaveOverlay => layout.OverlayBox(76, 10),
            // Boxes about files are as tall as their words at the width they get, frame included.
            SaveConflictOverlay c => FileBox(FileOverlayPresenter.SaveConflict(state, c, FileBoxInner(), glyphs).Length),
            SaveAsOverlay b => FileBox(FileOverlayPresenter.SaveAs(state, b, FileBoxInner(), glyphs).Length),
            RecoveryOverlay r => FileBox(FileOverlayPresenter.Recovery(state, r, FileBoxInner(), glyphs).Length),
            QuitConfirmOverlay => layout.OverlayBox(72, 6),
            _ => Box.Empty,
        };
        PlaceAt(overlay, box);
    }

    private const int FileBoxWidth = 76;

    private int FileBoxInner() => Math.Max(1, Math.Min(FileBoxWidth, layout.Screen.Width - 4) - 2);

    private Box FileBox(int lines) => layout.OverlayBox(FileBoxWidth, lines + 2);

    private IReadOnlyList<StyledLine> OverlayContent(int width, int height) => State.Overlay switch
    {
        HelpOverlay help => PaneContent.Help(help, width, height, glyphs),
        LibraryOverlay open => PaneContent.Library(State, open.Selected, width, height, glyphs),
        ValueEntryOverlay entry => PaneContent.ValueEntry(State, entry, width, glyphs),
        SaveOverlay dialog => PaneContent.SaveDialog(State, dialog, width, glyphs),
        SaveConflictOverlay conflict => PaneContent.Marked(FileOverlayPresenter.SaveConflict(State, conflict, width, glyphs), glyphs),
        SaveAsOverlay box => PaneContent.Marked(FileOverlayPresenter.SaveAs(State, box, width, glyphs), glyphs),
        RecoveryOverlay recovery => PaneContent.Marked(FileOverlayPresenter.Recovery(State, recovery, width, glyphs), glyphs),
        QuitConfirmOverlay => PaneContent.QuitConfirm(State, width, glyphs),
        _ => [],
    };

    private void OnStateChanged(WorkbenchState before, WorkbenchState after)
    {
        UpdateTitles(after);
        if (before.ShowsResponse != after.ShowsResponse)
        {
            SetNeedsLayout();
            return;
        }

        if (before.Overlay.GetType() != after.Overlay.GetType()
            || (after.Overlay is LibraryOverlay && before.Library != after.Library))
        {
            PlaceOverlay(after);
            RedrawAll();
            return;
        }

        if (!Equals(PlaneInputs(before), PlaneInputs(after)))
        {
            RedrawContent(plane);
        }

        if (!Equals(ResponseInputs(before), ResponseInputs(after)))
        {
            RedrawContent(response);
        }

        if (!Equals(ParameterInputs(before), ParameterInputs(after)))
        {
            RedrawContent(parameters);
        }

        if (!Equals(PoleInputs(before), PoleInputs(after)))
        {
            RedrawContent(poles);
        }

        if (before.Library != after.Library || before.Session?.Loaded.Plant.Path != after.Session?.Loaded.Plant.Path)
        {
            RedrawContent(library);
        }

        RedrawContent(overlay);
        RedrawContent(status);
        RedrawContent(tooSmall);
    }

    private static object PlaneInputs(WorkbenchState s) =>
        (s.Session?.Loaded, s.Session?.Locus, s.Session?.Poles, s.Session?.Band, s.Session?.CurrentLoop, s.Session?.Design, s.View, s.Focus,
            s.Session?.SelectedPole, s.Overlay is NoOverlay);

    private static object ResponseInputs(WorkbenchState s) =>
        (s.ShowsResponse, s.Session?.Response, s.Session?.Loaded.Plant.Specs);

    private static object ParameterInputs(WorkbenchState s) => (s.Session?.Loaded, s.Session?.Sweep, s.Session?.Varied, s.Session?.Disk);

    private static object PoleInputs(WorkbenchState s) =>
        (s.Session?.Poles, s.Session?.SelectedPole, s.Focus, s.Overlay is NoOverlay);

    private void UpdateTitles(WorkbenchState state)
    {
        string mark = glyphs.Selected + " ";
        string zoom = state.View.ZoomSteps == 0 ? string.Empty : $"  zoom {NumberText.Significant(state.View.ZoomFactor, 3)}x";
        string tracing = state.Session is { LocusIsCurrent: false } ? "  tracing" + glyphs.Ellipsis : string.Empty;
        string name = state.Session?.Loaded.Plane.IsSampled == true ? "z-plane" : "s-plane";
        plane.Heading = (state.Focus == Pane.Plane ? mark : string.Empty) + name + zoom + tracing;
        poles.Heading = (state.Focus == Pane.Poles ? mark : string.Empty) + "closed-loop poles";
        string simulating = state.Session is { ResponseIsCurrent: false } ? "  simulating" + glyphs.Ellipsis : string.Empty;
        string at = state.Session is { } session
            ? $" at {session.Sweep.Name} = {NumberText.Short(session.Sweep.Value)}"
              + (session.Varied.IsNominal ? string.Empty : ", " + StatusLinePresenter.VariedWords(session.Varied))
            : string.Empty;
        response.Heading = "step response" + at + simulating;
        overlay.Heading = state.Overlay switch
        {
            HelpOverlay => "help (Esc closes)",
            LibraryOverlay => "plant library",
            ValueEntryOverlay => "type a value",
            SaveOverlay => "save the operating point",
            SaveConflictOverlay { Reason: FileOnDisk.Missing } => "the plant file is gone",
            SaveConflictOverlay => "the plant file changed on disk",
            SaveAsOverlay => "save under another name",
            RecoveryOverlay => "recovery file found",
            QuitConfirmOverlay => "quit?",
            _ => string.Empty,
        };
    }

    // Only the inside of a pane: its frame has not changed, so it is not sent again.
    private static void RedrawContent(View view)
    {
        if (view.Visible)
        {
            view.SetNeedsDraw(new System.Drawing.Rectangle(0, 0, view.Viewport.Width, view.Viewport.Height));
        }
    }

    private void RedrawAll()
    {
        SetNeedsDraw();
        foreach (var view in new View[] { plane, response, parameters, legend, library, poles, status, overlay, tooSmall })
        {
            view.SetNeedsDraw();
        }
    }
}
