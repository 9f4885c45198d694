namespace TermLocus.Tui;

/// <summary>How the workbench was asked to start.</summary>
/// <param name="Path">A plant file or a folder of them; null for ./plants, else the library shipped with the program.</param>
/// <param name="NoColor">Draw without colour (also when NO_COLOR is set): selection by reverse attribute and bold.</param>
/// <param name="Symbols">"braille", "ascii" or null to decide from the locale.</param>
/// <param name="NoMouse">Leave the mouse to the terminal (its own select and copy).</param>
public sealed record WorkbenchOptions(string? Path = null, bool NoColor = false, string? Symbols = null, bool NoMouse = false);
