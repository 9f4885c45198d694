namespace TermLocus.App.Workbench;

/// <summary>The help text, scrolled so that line <paramref name="FirstLine"/> (0-based) is at the top.</summary>
/// <param name="FirstLine">First help line shown, &gt;= 0.</param>
public sealed record HelpOverlay(int FirstLine) : Overlay;
