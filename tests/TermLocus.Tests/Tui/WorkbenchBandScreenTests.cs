using System.Runtime.CompilerServices;
using TermLocus.App.Workbench;
using Terminal.Gui.Input;

namespace TermLocus.Tests.Tui;

/// <summary>
/// Band stepping, the step response, the z-plane and the design bar through the whole stack, on copies of the demo
/// plants with every effect performed in line, at 80x24 and 160x48.
/// </summary>
[Collection(TerminalGuiCollection.Name)]
public sealed class WorkbenchBandScreenTests : IDisposable
{
    // A fixed name: the roomy layout prints the folder (cut to the pane), which must not change between runs. The
    // collection runs these tests one at a time.
    private readonly string folder = Path.Combine(Path.GetTempPath(), "termlocus-band-screens");

    public WorkbenchBandScreenTests()
    {
        if (Directory.Exists(folder))
        {
            Directory.Delete(folder, recursive: true);
        }

        Directory.CreateDirectory(folder);
        foreach (var file in Directory.GetFiles(DemoPlants(), "*.toml"))
        {
            File.Copy(file, Path.Combine(folder, Path.GetFileName(file)));
        }
    }

    public void Dispose() => Directory.Delete(folder, recursive: true);

    [Theory]
    [InlineData(80, 24)]
    [InlineData(160, 48)]
    public void Stepping_the_band_down_shows_the_warm_oil_case(int width, int height)
    {
        using var h = Open("press-cylinder-position.toml", width, height);
        h.Press(Key.CursorDown, Key.CursorDown, Key.CursorDown);
        var session = h.Controller.State.Session!;
        Assert.Equal(0.104, session.Varied.Value, 1e-12); // stops: tenths of [0.09, 0.16] and the nominal 0.12: 0.118, 0.111, 0.104
        Match($"band-press-stepped-{width}x{height}", h);
    }

    [Theory]
    [InlineData(80, 24)]
    [InlineData(160, 48)]
    public void T_shows_the_step_response_that_follows_the_value(int width, int height)
    {
        using var h = Open("heat-exchanger-outlet.toml", width, height);
        h.Press(new Key('t'));
        Assert.True(h.Controller.State.Session!.ResponseIsCurrent);
        h.Press(Key.CursorRight);
        Assert.True(h.Controller.State.Session!.ResponseIsCurrent);
        Match($"response-heat-exchanger-{width}x{height}", h);
        h.Press(new Key('t'));
        Assert.Contains("s-plane", h.Screen(), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(80, 24)]
    [InlineData(160, 48)]
    public void A_sampled_loop_is_drawn_in_the_z_plane(int width, int height)
    {
        using var h = Open("digital-servo-axis.toml", width, height);
        string screen = h.Screen();
        Assert.Contains("z-plane", screen, StringComparison.Ordinal);
        Assert.Contains("pole in z", screen, StringComparison.Ordinal);
        Match($"zplane-digital-servo-{width}x{height}", h);
    }

    [Fact]
    public void D_jumps_to_the_recommended_value_and_the_status_line_names_the_limit()
    {
        using var h = Open("press-cylinder-position.toml", 80, 24);
        h.Press(new Key('d'));
        var state = h.Controller.State;
        Assert.StartsWith("recommended Kp = ", state.Message!.Text, StringComparison.Ordinal);
        Assert.Contains("nearest end", h.Screen(), StringComparison.Ordinal);
        Assert.True(state.Unsaved);
    }

    [Fact]
    public void A_band_step_writes_few_cells()
    {
        using var h = Open("conveyor-speed.toml", 80, 24);
        string before = h.Screen();
        h.Press(Key.CursorUp);
        string after = h.Screen();
        int changed = before.Zip(after).Count(p => p.First != p.Second);
        Assert.InRange(changed, 1, 400); // the poles, their figures and the band line move; the frame and the rest stay
    }

    private ScreenHarness Open(string file, int width, int height)
    {
        var h = ScreenHarness.OnFolder(width, height, folder, Path.Combine(folder, file));
        h.Press(Key.Esc);
        return h;
    }

    private void Match(string name, ScreenHarness h, [CallerFilePath] string caller = "") =>
        Snapshot.Match(name, h.Screen().Replace(folder, "<folder>", StringComparison.Ordinal), caller);

    private static string DemoPlants([CallerFilePath] string here = "") =>
        Path.GetFullPath(Path.Combine(Path.GetDirectoryName(here)!, "..", "..", "..", "plants"));
}
