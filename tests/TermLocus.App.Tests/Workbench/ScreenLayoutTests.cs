using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

public class ScreenLayoutTests
{
    [Fact]
    public void Compact_80x24_puts_plane_and_parameters_on_top_then_poles_and_status()
    {
        var layout = ScreenLayout.For(80, 24);
        Assert.Equal(LayoutMode.Compact, layout.Mode);
        Assert.Equal(new Box(0, 0, 50, 14), layout.Plane);
        Assert.Equal(new Box(50, 0, 30, 14), layout.Parameters);
        Assert.Equal(new Box(0, 14, 80, 7), layout.Poles);
        Assert.Equal(new Box(0, 21, 80, 3), layout.Status);
        Assert.True(layout.Legend.IsEmpty);
        Assert.True(layout.Library.IsEmpty);
    }

    [Fact]
    public void Roomy_160x48_adds_legend_and_library_to_the_side_column()
    {
        var layout = ScreenLayout.For(160, 48);
        Assert.Equal(LayoutMode.Roomy, layout.Mode);
        Assert.Equal(new Box(0, 0, 116, 35), layout.Plane);
        Assert.Equal(new Box(116, 0, 44, 14), layout.Parameters);
        Assert.Equal(new Box(116, 14, 44, 7), layout.Legend);
        Assert.Equal(new Box(116, 21, 44, 14), layout.Library);
        Assert.Equal(new Box(0, 35, 160, 10), layout.Poles);
        Assert.Equal(new Box(0, 45, 160, 3), layout.Status);
    }

    [Theory]
    [InlineData(59, 24)]
    [InlineData(80, 19)]
    [InlineData(0, 0)]
    public void Below_the_minimum_only_the_message_remains(int width, int height)
    {
        var layout = ScreenLayout.For(width, height);
        Assert.Equal(LayoutMode.TooSmall, layout.Mode);
        Assert.True(layout.Plane.IsEmpty && layout.Poles.IsEmpty && layout.Status.IsEmpty);
    }

    [Theory]
    [InlineData(60, 20)]
    [InlineData(80, 24)]
    [InlineData(119, 50)]
    [InlineData(120, 36)]
    [InlineData(160, 48)]
    [InlineData(300, 90)]
    public void Panes_tile_the_screen_without_overlapping(int width, int height)
    {
        var layout = ScreenLayout.For(width, height);
        var boxes = new[] { layout.Plane, layout.Parameters, layout.Legend, layout.Library, layout.Poles, layout.Status }
            .Where(b => !b.IsEmpty).ToList();
        var covered = new int[width, height];
        foreach (var b in boxes)
        {
            for (int x = b.X; x < b.X + b.Width; x++)
            {
                for (int y = b.Y; y < b.Y + b.Height; y++)
                {
                    covered[x, y]++;
                }
            }
        }

        Assert.All(Enumerable.Range(0, width), x => Assert.All(Enumerable.Range(0, height), y => Assert.Equal(1, covered[x, y])));
    }

    [Fact]
    public void Overlays_are_centred_with_a_margin()
    {
        var layout = ScreenLayout.For(80, 24);
        Assert.Equal(new Box(14, 8, 52, 7), layout.OverlayBox(52, 7));
        Assert.Equal(new Box(2, 1, 76, 22), layout.OverlayBox(200, 200));
    }
}
