using System.Runtime.CompilerServices;
using Terminal.Gui.App;
using Terminal.Gui.Drivers;

namespace TermLocus.Tui;

/// <summary>
/// Gives a new, not yet initialised application the <see cref="QuietAnsiInput"/>. Terminal.Gui 2.5 takes a component
/// factory only through a constructor it keeps internal, so the factory field that constructor sets is written here,
/// with a compile-time accessor (no reflection, so the native build keeps it). If a later toolkit renames the field,
/// the accessor throws and the toolkit's own input is used: the workbench works, only less quietly.
/// </summary>
internal static class QuietInputInstaller
{
    /// <summary>Installs the quiet input before <c>Init</c>; returns it (to wake on shutdown) or null when the toolkit's own is kept.</summary>
    public static QuietAnsiInput? TryInstall(IApplication app)
    {
        if (!OperatingSystem.IsLinux())
        {
            return null;
        }

        var input = new QuietAnsiInput();
        if (!input.CanWait)
        {
            input.Dispose();
            return null;
        }

        try
        {
            ref var factory = ref ComponentFactory(app);
            if (factory is not null)
            {
                input.Dispose();
                return null;
            }

            factory = new AnsiComponentFactory(input);
            return input;
        }
        catch (Exception e) when (e is MissingMemberException or InvalidCastException or TypeLoadException)
        {
            input.Dispose();
            return null;
        }
    }

    /// <summary>The component factory the application will use (null: the toolkit chooses its own).</summary>
    internal static IComponentFactory? InstalledFactory(IApplication app) => ComponentFactory(app);

    [UnsafeAccessor(UnsafeAccessorKind.Field, Name = "_componentFactory")]
    private static extern ref IComponentFactory? ComponentFactory(
        [UnsafeAccessorType("Terminal.Gui.App.ApplicationImpl, Terminal.Gui")] object app);
}
