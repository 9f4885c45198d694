using System.Collections.Immutable;
using System.Numerics;
using BenchmarkDotNet.Attributes;
using TermLocus.App.Canvas;
using TermLocus.App.Plot;

namespace TermLocus.Benchmarks;

/// <summary>One arrow-key step redraws the plane plot: 10 branches of 300 points each at 160 x 48 cells.
/// Target: well under 1 ms per redraw.</summary>
[MemoryDiagnoser]
public class CanvasBenchmarks
{
    private const int Columns = 160;
    private const int Rows = 48;

    private PlaneScene scene = PlaneScene.Empty;
    private PlaneView view = new(Complex.Zero, 1);
    private DotCanvas canvas = new(Columns, Rows, CanvasSymbols.Braille);

    [Params(CanvasSymbols.Braille, CanvasSymbols.Ascii)]
    public CanvasSymbols Symbols { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        // Invented spiral-like branches that leave the view, so clipping is exercised as well as drawing.
        var branches = ImmutableArray.CreateBuilder<PlaneBranch>();
        for (int b = 0; b < 10; b++)
        {
            var points = ImmutableArray.CreateBuilder<Complex>(300);
            for (int i = 0; i < 300; i++)
            {
                double t = i / 299.0;
                double angle = (b * 0.63) + (t * 2.5);
                points.Add(new Complex(-1.5 - (b * 0.4), 0) + Complex.FromPolarCoordinates(0.2 + (t * 9), angle));
            }

            branches.Add(new PlaneBranch(b, points.MoveToImmutable()));
        }

        scene = new PlaneScene
        {
            Branches = branches.ToImmutable(),
            OpenLoopPoles = [new Complex(0, 0), new Complex(-2, 1), new Complex(-2, -1)],
            OpenLoopZeros = [new Complex(-4, 0)],
            CurrentPoles = [new CurrentPole(new Complex(-1, 2)), new CurrentPole(new Complex(-1, -2), true)],
            Boundaries = [SPlaneBoundaries.Damping(0.5, 50), SPlaneBoundaries.DecayRate(0.5, 50), SPlaneBoundaries.NaturalFrequency(3)],
        };
        view = PlaneView.Fit(scene.Branches.SelectMany(b => b.Points).Where(p => p.Magnitude < 6), Columns, Rows);
        canvas = new DotCanvas(Columns, Rows, Symbols);
    }

    /// <summary>Draws into a reused canvas and builds the text lines: what the workbench does per key press.</summary>
    [Benchmark]
    public IReadOnlyList<string> RedrawIntoReusedCanvas()
    {
        PlaneRenderer.RenderInto(canvas, scene, view);
        return canvas.Lines();
    }

    /// <summary>A fresh canvas plus lines and tags: what <c>termlocus plot</c> does once.</summary>
    [Benchmark]
    public RenderedPlane RenderFresh() => PlaneRenderer.Render(scene, view, Columns, Rows, Symbols);
}
