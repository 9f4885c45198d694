using Terminal.Gui.App;

namespace TermLocus.Tui;

/// <summary>How the workbench sets up Terminal.Gui's driver, in one place for the program and its screen tests.</summary>
internal static class TerminalSetup
{
    // DECRST of the X10/normal/button/any-event tracking modes and the UTF-8, SGR and URXVT coordinate encodings.
    private const string MouseReportingOff = "\u001b[?1000l\u001b[?1002l\u001b[?1003l\u001b[?1005l\u001b[?1006l\u001b[?1015l";

    /// <summary>Call after <c>Init</c>: 16 colours only, and the mouse left to the terminal when asked.</summary>
    public static void Configure(IApplication app, bool noMouse)
    {
        app.Mouse.IsMouseDisabled = noMouse;
        if (app.Driver is not { } driver)
        {
            return;
        }

        // Conservative colour depth: SSH and tmux rarely pass COLORTERM; we only use the 16 ANSI colours anyway.
        driver.Force16Colors = true;
        if (noMouse)
        {
            // Terminal.Gui 2.5 turns mouse reporting on even when the mouse is disabled; turn it off again so the
            // terminal keeps its own select-and-copy.
            driver.WriteRaw(MouseReportingOff);
        }
    }
}
