using TermLocus.App.Canvas;
using TermLocus.App.Workbench;
using TermLocus.Core.Plants;

namespace TermLocus.App.Tests.Workbench;

public class PlanePresenterTests
{
    [Fact]
    public void A_click_on_a_traced_point_picks_its_value_and_a_click_far_away_picks_nothing()
    {
        // Branches on the real axis: 0 -> -1 and -2 -> -1 over K in [0, 1] (TestPlants.Traced).
        var state = TestPlants.Traced();
        var (_, view) = PlanePresenter.SceneAndView(state, 40, 12);
        var bounds = view.Bounds(40, 12);
        int column = (int)((-2.0 - bounds.MinReal) / view.UnitsPerColumn);
        int row = (int)((bounds.MaxImaginary - 0.0) / view.UnitsPerRow);
        Assert.Equal(0.0, PlanePresenter.PickValue(state, column, row, 40, 12));
        Assert.Null(PlanePresenter.PickValue(state, 39, 0, 40, 12));
    }

    [Fact]
    public void Poles_that_miss_a_spec_are_drawn_as_off_spec()
    {
        // K = 5 with ζ >= 0.5: the pair -1 ± j2 has ζ = 0.447 and misses.
        var state = TestPlants.Opened(TestPlants.SecondOrder(specs: new Specs(MinDamping: 0.5)));
        var (scene, _) = PlanePresenter.SceneAndView(state, 40, 12);
        Assert.Equal(2, scene.CurrentPoles.Length);
        Assert.All(scene.CurrentPoles, p => Assert.True(p.ViolatesSpecs));
        Assert.Single(scene.Boundaries);
    }

    [Fact]
    public void The_view_holds_still_while_stepping_and_follows_zoom()
    {
        var state = TestPlants.Traced();
        var (_, fitted) = PlanePresenter.SceneAndView(state, 40, 12);
        var (_, stepped) = PlanePresenter.SceneAndView(TestPlants.Run(state, Command.StepSweepUp).State, 40, 12);
        var (_, zoomed) = PlanePresenter.SceneAndView(TestPlants.Run(state, Command.ZoomIn).State, 40, 12);
        Assert.Equal(fitted, stepped);
        Assert.Equal(fitted.UnitsPerColumn / 1.5, zoomed.UnitsPerColumn, 1e-12);
    }

    [Fact]
    public void Rendering_fills_the_area_asked_for()
    {
        var plane = PlanePresenter.Render(TestPlants.Traced(), 30, 8, CanvasSymbols.Braille);
        Assert.Equal(8, plane.Lines.Count);
        Assert.All(plane.Lines, l => Assert.Equal(30, l.Length));
    }
}
