namespace TermLocus.App.Workbench;

/// <summary>
/// Where each pane goes for a terminal size. Pure, so the layout at 80x24 and 160x48 is tested without a terminal.
/// Top: the s-plane with a side column (parameters; in roomy layouts also the legend and the library list); below:
/// the pole table; bottom: three status lines.
/// </summary>
/// <param name="Mode">Too small, compact or roomy.</param>
/// <param name="Screen">The whole screen.</param>
/// <param name="Plane">The s-plane pane (with its frame).</param>
/// <param name="Parameters">The parameter panel (with its frame).</param>
/// <param name="Legend">The legend pane, or empty in compact layouts (the plane then shows a one-line legend).</param>
/// <param name="Library">The library list pane, or empty when there is no room.</param>
/// <param name="Poles">The pole table (with its frame).</param>
/// <param name="Status">The status lines (no frame).</param>
public sealed record ScreenLayout(
    LayoutMode Mode, Box Screen, Box Plane, Box Parameters, Box Legend, Box Library, Box Poles, Box Status)
{
    /// <summary>Narrowest usable screen.</summary>
    public const int MinimumWidth = 60;

    /// <summary>Lowest usable screen.</summary>
    public const int MinimumHeight = 20;

    /// <summary>From this width (and <see cref="RoomyHeight"/>) the side column gets the legend and library.</summary>
    public const int RoomyWidth = 120;

    /// <summary>From this height (and <see cref="RoomyWidth"/>) the side column gets the legend and library.</summary>
    public const int RoomyHeight = 36;

    /// <summary>The step-response pane (with its frame), or empty when the response is not shown.</summary>
    public Box Response { get; init; } = Box.Empty;

    /// <summary>Share of the plane's rows the plane keeps when the roomy layout shows the response below it.</summary>
    public const double RoomyPlaneShare = 0.55;

    /// <summary>Rows of the status area.</summary>
    public const int StatusRows = 3;

    private const int LegendRows = 7;
    private const int MinimumLibraryRows = 5;

    /// <summary>
    /// The layout for a <paramref name="width"/> × <paramref name="height"/> screen; with <paramref name="response"/>
    /// the step response takes the plane's place (compact) or the lower part of it (roomy).
    /// </summary>
    public static ScreenLayout For(int width, int height, bool response)
    {
        var layout = For(width, height);
        if (!response || layout.Mode == LayoutMode.TooSmall)
        {
            return layout;
        }

        var plane = layout.Plane;
        if (layout.Mode == LayoutMode.Compact)
        {
            return layout with { Plane = Box.Empty, Response = plane };
        }

        int planeRows = (int)Math.Round(plane.Height * RoomyPlaneShare);
        return layout with
        {
            Plane = plane with { Height = planeRows },
            Response = new Box(plane.X, plane.Y + planeRows, plane.Width, plane.Height - planeRows),
        };
    }

    /// <summary>The layout for a <paramref name="width"/> × <paramref name="height"/> screen.</summary>
    public static ScreenLayout For(int width, int height)
    {
        var screen = new Box(0, 0, Math.Max(0, width), Math.Max(0, height));
        if (width < MinimumWidth || height < MinimumHeight)
        {
            return new ScreenLayout(LayoutMode.TooSmall, screen, Box.Empty, Box.Empty, Box.Empty, Box.Empty, Box.Empty, Box.Empty);
        }

        bool roomy = width >= RoomyWidth && height >= RoomyHeight;
        int polesRows = Math.Clamp((height - StatusRows) / 3, 5, 10);
        int topRows = height - StatusRows - polesRows;
        int sideWidth = Math.Clamp(width * 3 / 8, 28, 44);
        var plane = new Box(0, 0, width - sideWidth, topRows);
        var poles = new Box(0, topRows, width, polesRows);
        var status = new Box(0, height - StatusRows, width, StatusRows);
        if (!roomy)
        {
            var side = new Box(plane.Width, 0, sideWidth, topRows);
            return new ScreenLayout(LayoutMode.Compact, screen, plane, side, Box.Empty, Box.Empty, poles, status);
        }

        int parameterRows = Math.Min(14, topRows - LegendRows);
        int libraryRows = topRows - parameterRows - LegendRows;
        if (libraryRows < MinimumLibraryRows)
        {
            // No room for a useful list: the parameters take the rows (the library overlay is still on o).
            parameterRows = topRows - LegendRows;
            libraryRows = 0;
        }

        var parameters = new Box(plane.Width, 0, sideWidth, parameterRows);
        var legend = new Box(plane.Width, parameterRows, sideWidth, LegendRows);
        var library = libraryRows > 0 ? new Box(plane.Width, parameterRows + LegendRows, sideWidth, libraryRows) : Box.Empty;
        return new ScreenLayout(LayoutMode.Roomy, screen, plane, parameters, legend, library, poles, status);
    }

    /// <summary>Where an overlay goes: centred, at most <paramref name="width"/> × <paramref name="height"/>,
    /// leaving a margin of the screen around it when it can.</summary>
    public Box OverlayBox(int width, int height)
    {
        var inner = Screen.Width > 8 && Screen.Height > 6
            ? new Box(2, 1, Screen.Width - 4, Screen.Height - 2)
            : Screen;
        return Box.Centred(inner, width, height);
    }
}
