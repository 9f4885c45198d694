using System.Runtime.CompilerServices;
using TermLocus.App.Canvas;
using TermLocus.App.Workbench;
using TermLocus.Tui;
using Terminal.Gui.App;
using Terminal.Gui.Drivers;
using Terminal.Gui.Input;
using Terminal.Gui.Testing;
using Command = TermLocus.App.Workbench.Command;

namespace TermLocus.Tests.Tui;

/// <summary>
/// The workbench screen on Terminal.Gui's in-process ANSI driver (no real terminal I/O) at a fixed size. Effects are
/// recorded, not run; tests deliver their outcomes as messages, so every screen is deterministic.
/// </summary>
internal sealed class ScreenHarness : IDisposable
{
    private readonly IApplication app;
    private readonly WorkbenchScreen screen;
    private readonly SessionToken? token;

    private ScreenHarness(int width, int height, CanvasSymbols symbols, bool colour, string? folder, bool realEffects)
    {
        Environment.SetEnvironmentVariable("DisableRealDriverIO", "1");
        app = Application.Create();
        app.Init(DriverRegistry.Names.ANSI);
        TerminalSetup.Configure(app, noMouse: false);
        app.Driver!.SetScreenSize(width, height);
        var (state, _) = Update.Start(null, folder);
        var worker = new EffectWorker(new SaveContext(() => new DateTimeOffset(2026, 1, 2, 3, 4, 5, TimeSpan.Zero), "tester@bench"));
        Controller = new WorkbenchController(state, new InlineEffectRunner(e => Record(e, realEffects ? worker : null)), () => Quit = true);
        screen = new WorkbenchScreen(Controller, Palette.For(colour), symbols);
        KeyRouter.Install(app, Controller, screen);
        token = app.Begin(screen);
        app.LayoutAndDraw();
    }

    public WorkbenchController Controller { get; }

    public List<Effect> Effects { get; } = [];

    public bool Quit { get; private set; }

    public static ScreenHarness Start(int width, int height, CanvasSymbols symbols = CanvasSymbols.Braille, bool colour = true, string? folder = ScreenPlants.Folder) =>
        new(width, height, symbols, colour, folder, realEffects: false);

    /// <summary>The workbench on a real folder with every effect really performed (reading, tracing, saving).</summary>
    public static ScreenHarness OnFolder(int width, int height, string folder, string? plantFile = null)
    {
        var harness = new ScreenHarness(width, height, CanvasSymbols.Braille, true, folder, realEffects: true);
        harness.Controller.Start(Update.Start(plantFile, folder).Effects);
        harness.app.LayoutAndDraw();
        return harness;
    }

    /// <summary>The workbench screen (for draw counts).</summary>
    public WorkbenchScreen ScreenView => screen;

    /// <summary>Opens <see cref="ScreenPlants.SecondOrder"/> with its library and traced locus.</summary>
    public ScreenHarness WithSecondOrder(double k = 2)
    {
        var loaded = ScreenPlants.SecondOrder(k);
        Deliver(new LibraryScanned(ScreenPlants.Folder, ScreenPlants.Library()));
        Deliver(new PlantLoaded(loaded));
        Deliver(new LocusTraced(ScreenPlants.SecondOrderLocus(loaded)));
        Controller.Dispatch(Command.Cancel); // clear the "opened" message
        app.LayoutAndDraw();
        return this;
    }

    public void Deliver(Message message)
    {
        Controller.Receive(message);
        app.LayoutAndDraw();
    }

    public void Press(params Key[] keys)
    {
        foreach (var key in keys)
        {
            app.InjectKey(key);
        }

        app.LayoutAndDraw();
    }

    public void Type(string text) => Press(text.Select(c => new Key(c)).ToArray());

    public void Resize(int width, int height)
    {
        app.Driver!.SetScreenSize(width, height);
        app.LayoutAndDraw();
    }

    public string Screen() => app.Driver!.ToString()!;

    /// <summary>The screen with ANSI attributes, for checks that colour is (or is not) sent.</summary>
    public string Ansi() => app.Driver!.ToAnsi();

    public void Dispose()
    {
        if (token is not null)
        {
            app.End(token);
        }

        screen.Dispose();
        app.Dispose();
    }

    private Message? Record(Effect effect, EffectWorker? worker)
    {
        Effects.Add(effect);
        return worker?.Perform(effect);
    }
}
