namespace TermLocus.App.Text;

/// <summary>
/// The symbols presenters print. Unicode where the terminal has a UTF-8 locale, plain ASCII words otherwise, so a
/// Linux console or a misconfigured SSH session still reads every label.
/// </summary>
/// <param name="Zeta">Damping ratio.</param>
/// <param name="NaturalFrequency">Natural frequency.</param>
/// <param name="DecayRate">Decay rate.</param>
/// <param name="TimeToHalf">Time to half amplitude.</param>
/// <param name="TimeToDouble">Time to double amplitude.</param>
/// <param name="DampedFrequency">Damped frequency.</param>
/// <param name="PlusMinus">The ± of a conjugate pair.</param>
/// <param name="Imaginary">The imaginary unit prefix.</param>
/// <param name="Met">Mark for a met spec.</param>
/// <param name="Violated">Mark for a violated spec (never colour alone).</param>
/// <param name="Selected">Mark of the selected row.</param>
/// <param name="Ellipsis">Shown where text was cut.</param>
/// <param name="BarFilled">Filled part of a position bar.</param>
/// <param name="BarEmpty">Empty part of a position bar.</param>
/// <param name="BarMarker">The current position on a bar.</param>
/// <param name="Left">Left arrow key name.</param>
/// <param name="Right">Right arrow key name.</param>
/// <param name="Up">Up arrow key name.</param>
/// <param name="Down">Down arrow key name.</param>
/// <param name="AtLeast">"not below" relation.</param>
/// <param name="AtMost">"not above" relation.</param>
public sealed record Glyphs(
    string Zeta,
    string NaturalFrequency,
    string DecayRate,
    string TimeToHalf,
    string TimeToDouble,
    string DampedFrequency,
    string PlusMinus,
    string Imaginary,
    string Met,
    string Violated,
    string Selected,
    string Ellipsis,
    string BarFilled,
    string BarEmpty,
    string BarMarker,
    string Left,
    string Right,
    string Up,
    string Down,
    string AtLeast,
    string AtMost)
{
    /// <summary>Symbols for a UTF-8 terminal.</summary>
    public static Glyphs Unicode { get; } = new(
        "ζ", "ωn", "σ", "t½", "t×2", "ωd", "±", "j", "✓", "!", "▸", "…", "─", "·", "●", "←", "→", "↑", "↓", "≥", "≤");

    /// <summary>Symbols for a terminal without UTF-8.</summary>
    public static Glyphs Ascii { get; } = new(
        "zeta", "wn", "sigma", "t1/2", "t*2", "wd", "+/-", "j", "ok", "!", ">", "~", "-", ".", "#", "Left", "Right", "Up", "Down", ">=", "<=");
}
