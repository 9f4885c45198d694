using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

// Switches over our enums list every named value and have no default arm, so a new value breaks the build (CS8509);
// values outside the enum (CS8524) cannot occur.
#pragma warning disable CS8524

/// <summary>
/// A key as the workbench sees it, independent of any terminal library: a special key or a printable character,
/// optionally with Ctrl. Shifted letters are simply their capital character.
/// </summary>
/// <param name="Special">The special key, or <see cref="SpecialKey.None"/> for a printable character.</param>
/// <param name="Character">The printable character when <paramref name="Special"/> is None, else '\0'.</param>
/// <param name="Ctrl">True when Ctrl is held (used only for Ctrl+C, which must always work).</param>
public readonly record struct KeyChord(SpecialKey Special, char Character, bool Ctrl = false)
{
    /// <summary>A printable character.</summary>
    public static KeyChord Of(char character) => new(SpecialKey.None, character);

    /// <summary>A special key.</summary>
    public static KeyChord Of(SpecialKey special) => new(special, '\0');

    /// <summary>Ctrl with a letter, e.g. Ctrl+C.</summary>
    public static KeyChord CtrlOf(char letter) => new(SpecialKey.None, char.ToLowerInvariant(letter), Ctrl: true);

    /// <summary>The key's name as help and hints print it, e.g. "→", "PgDn", "q", "Ctrl+C".</summary>
    public string Name(Glyphs glyphs)
    {
        if (Ctrl)
        {
            return "Ctrl+" + char.ToUpperInvariant(Character);
        }

        return Special switch
        {
            SpecialKey.None => Character == ' ' ? "Space" : Character.ToString(),
            SpecialKey.Left => glyphs.Left,
            SpecialKey.Right => glyphs.Right,
            SpecialKey.Up => glyphs.Up,
            SpecialKey.Down => glyphs.Down,
            SpecialKey.Home => "Home",
            SpecialKey.End => "End",
            SpecialKey.PageUp => "PgUp",
            SpecialKey.PageDown => "PgDn",
            SpecialKey.Tab => "Tab",
            SpecialKey.Enter => "Enter",
            SpecialKey.Escape => "Esc",
            SpecialKey.Backspace => "Backspace",
        };
    }
}
