using TermLocus.App.Canvas;
using TermLocus.App.Text;
using TermLocus.App.Workbench;
using Terminal.Gui.App;
using Terminal.Gui.Drivers;

namespace TermLocus.Tui;

/// <summary>
/// The full-screen workbench, <c>termlocus [PATH]</c>. Restores the terminal on every way out: q, Ctrl+C, an
/// exception, SIGTERM, SIGHUP; an unsaved chosen value then goes to <c>&lt;plant&gt;.toml.recovery</c> beside the plant.
/// </summary>
public static class WorkbenchApp
{
    /// <summary>
    /// Runs the workbench until the user quits; returns the exit code: 0 done, 2 cannot start, 70 internal error,
    /// 128 + n when ended by signal n (SIGTERM, SIGINT, SIGQUIT; SIGHUP ends the process by its default action).
    /// </summary>
    /// <param name="options">What to open and how to draw.</param>
    /// <param name="stderr">Where start-up problems and crash reports go (after the terminal is restored).</param>
    public static int Run(WorkbenchOptions options, TextWriter stderr)
    {
        ArgumentNullException.ThrowIfNull(options);
        ArgumentNullException.ThrowIfNull(stderr);
        var environment = Environment.GetEnvironmentVariables()
            .Cast<System.Collections.DictionaryEntry>()
            .ToDictionary(e => (string)e.Key, e => (string?)e.Value, StringComparer.Ordinal);
        if (StartProblem(options, environment) is { } problem)
        {
            stderr.WriteLine("termlocus: error: " + problem);
            return 2;
        }

        var (plantFile, folder, missing) = LibraryLocator.Resolve(options.Path, Environment.CurrentDirectory, AppContext.BaseDirectory);
        if (missing is not null)
        {
            stderr.WriteLine("termlocus: error: " + missing);
            return 2;
        }

        var symbols = SymbolChoice.Detect(environment, options.Symbols);
        bool colour = !options.NoColor && string.IsNullOrEmpty(environment.GetValueOrDefault("NO_COLOR"));
        var (crash, signalExit, recovery) = RunScreen(plantFile, folder, symbols, colour, options.NoMouse);
        if (crash is not null)
        {
            stderr.WriteLine($"termlocus: internal error: {crash.GetType().Name}: {crash.Message}");
            stderr.WriteLine(crash.StackTrace);
            foreach (string line in recovery)
            {
                stderr.WriteLine("termlocus: " + SafeText.Visible(line));
            }

            return 70;
        }

        return signalExit;
    }

    private static string? StartProblem(WorkbenchOptions options, IReadOnlyDictionary<string, string?> environment)
    {
        if (!SymbolChoice.TryParseRequest(options.Symbols, out _))
        {
            return $"--symbols must be braille or ascii, not '{options.Symbols}'";
        }

        if (Console.IsInputRedirected || Console.IsOutputRedirected)
        {
            return "the workbench needs a terminal; for scripts use a verb such as 'termlocus check' (see termlocus --help)";
        }

        string term = environment.GetValueOrDefault("TERM") ?? string.Empty;
        if (term == "dumb")
        {
            return "TERM=dumb cannot draw the workbench; use a verb such as 'termlocus check', or set TERM (e.g. xterm-256color)";
        }

        return null;
    }

    // Everything that touches the terminal lives here, so that it is restored (by disposing the application) before
    // anything is printed.
    private static (Exception? Crash, int ExitCode, IReadOnlyList<string> Recovery) RunScreen(string? plantFile, string? folder, CanvasSymbols symbols, bool colour, bool noMouse)
    {
        int exitCode = 0;
        var (state, effects) = Update.Start(plantFile, folder);
        var worker = new EffectWorker(new SaveContext(() => DateTimeOffset.UtcNow, $"{Environment.UserName}@{Environment.MachineName}"));
        using IApplication app = Application.Create();
        var quietInput = QuietInputInstaller.TryInstall(app);
        app.Init(DriverRegistry.Names.ANSI);
        TerminalSetup.Configure(app, noMouse);

        // Event-paced main loop only with the quiet input: it is what tells the loop that a key came.
        using var pacer = quietInput is null ? null : new MainLoopPacer(app);
        if (quietInput is not null)
        {
            quietInput.InputArrived = pacer!.Wake;
        }

        void Post(Action action)
        {
            app.Invoke(action);
            pacer?.Wake();
        }

        var controller = new WorkbenchController(state, new BackgroundEffectRunner(Post, worker), () => app.RequestStop());
        using var screen = new WorkbenchScreen(controller, Palette.For(colour), symbols);
        KeyRouter.Install(app, controller, screen);
        using var watch = new PlantFileWatch(controller, Post);
        using var signals = new SignalGuard(
            stop: code =>
            {
                exitCode = code;
                Post(controller.EmergencyExit);
            },
            hangUp: () => _ = WriteRecovery(controller.State, worker));
        controller.Start(effects);
        try
        {
            app.Run(screen);
            return (null, exitCode, []);
        }
        catch (Exception e) when (e is not OutOfMemoryException)
        {
            // Keep the user's value before the terminal is restored and the report printed.
            return (e, 70, WriteRecovery(controller.State, worker));
        }
        finally
        {
            // Disposing the application waits for the input loop, which may be blocked waiting for a key.
            quietInput?.WakeUp();
        }
    }

    // The state is immutable, so reading it from another thread is safe; Update decides whether anything is unsaved.
    // Returns what became of each unsaved value, for the report printed once the terminal is restored (after a
    // hang-up there is no terminal, and nobody to tell).
    private static List<string> WriteRecovery(WorkbenchState state, EffectWorker worker)
    {
        var outcome = new List<string>();
        foreach (var effect in Update.Apply(state, Command.QuitNow).Effects.OfType<SaveRecoveryEffect>())
        {
            outcome.Add(worker.Perform(effect) is OperatingPointSaveFailed failed
                ? failed.Problem
                : $"the unsaved value was kept in {SaveRecoveryEffect.RecoveryPathFor(effect.Loaded.Document?.Path ?? "the plant file")}; it is offered when the plant is opened next");
        }

        return outcome;
    }
}
