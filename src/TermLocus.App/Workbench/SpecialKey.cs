namespace TermLocus.App.Workbench;

/// <summary>Keys that have no printable character. <see cref="None"/> means the chord is a printable character.</summary>
public enum SpecialKey
{
    /// <summary>A printable character (see <see cref="KeyChord.Character"/>).</summary>
    None,

    /// <summary>Left arrow.</summary>
    Left,

    /// <summary>Right arrow.</summary>
    Right,

    /// <summary>Up arrow.</summary>
    Up,

    /// <summary>Down arrow.</summary>
    Down,

    /// <summary>Home.</summary>
    Home,

    /// <summary>End.</summary>
    End,

    /// <summary>Page up.</summary>
    PageUp,

    /// <summary>Page down.</summary>
    PageDown,

    /// <summary>Tab.</summary>
    Tab,

    /// <summary>Enter / Return.</summary>
    Enter,

    /// <summary>Escape.</summary>
    Escape,

    /// <summary>Backspace.</summary>
    Backspace,
}
