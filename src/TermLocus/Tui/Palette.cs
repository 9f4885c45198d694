using TermLocus.App.Canvas;
using Terminal.Gui.Drawing;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace TermLocus.Tui;

#pragma warning disable CS8524 // every named value is handled; see Update.

/// <summary>
/// Colours and styles. With colour: the terminal's own foreground and background plus the 16 ANSI colours (no dark
/// blue on black; branch colours chosen to stay apart for common colour-vision deficiencies). Without colour (NO_COLOR,
/// --no-color): the terminal's colours only, with reverse attribute and bold carrying selection and emphasis.
/// </summary>
internal sealed class Palette
{
    private static readonly Color Default = Color.None;

    private static readonly Color[] BranchColours =
        [Color.Cyan, Color.Yellow, Color.Magenta, Color.Green, Color.BrightBlue, Color.BrightYellow, Color.BrightCyan, Color.BrightMagenta];

    private Palette(bool colour) => UsesColour = colour;

    /// <summary>False when drawing without colour.</summary>
    public bool UsesColour { get; }

    /// <summary>The palette for the colour choice.</summary>
    public static Palette For(bool colour) => new(colour);

    /// <summary>The attribute of a text tone.</summary>
    public Attr For(Tone tone) => UsesColour ? ColourFor(tone) : MonochromeFor(tone);

    /// <summary>The attribute of a plot cell drawn by <paramref name="tag"/>.</summary>
    public Attr For(CellTag tag)
    {
        if (!UsesColour)
        {
            return tag.Layer switch
            {
                CellLayer.CurrentPole or CellLayer.OpenLoopPole or CellLayer.OpenLoopZero => Plain(TextStyle.Bold),
                CellLayer.CurrentPoleViolating => Plain(TextStyle.Bold | TextStyle.Underline),
                CellLayer.Marker => Plain(TextStyle.Reverse),
                CellLayer.Grid or CellLayer.BandTrail => Plain(TextStyle.Faint),
                _ => Plain(TextStyle.None),
            };
        }

        return tag.Layer switch
        {
            CellLayer.None or CellLayer.Label => Plain(TextStyle.None),
            CellLayer.Grid or CellLayer.Axis or CellLayer.BandTrail => new Attr(Color.DarkGray, Default),
            CellLayer.SpecBoundary => new Attr(Color.Gray, Default),
            CellLayer.Branch => new Attr(BranchColours[Math.Abs(tag.Index) % BranchColours.Length], Default),
            CellLayer.OpenLoopZero or CellLayer.OpenLoopPole => new Attr(Color.White, Default, TextStyle.Bold),
            CellLayer.CurrentPole => new Attr(Color.BrightGreen, Default, TextStyle.Bold),
            CellLayer.CurrentPoleViolating => new Attr(Color.BrightRed, Default, TextStyle.Bold),
            CellLayer.Marker => new Attr(Color.BrightYellow, Default, TextStyle.Bold | TextStyle.Reverse),
        };
    }

    private static Attr Plain(TextStyle style) => new(Default, Default, style);

    private static Attr ColourFor(Tone tone) => tone switch
    {
        Tone.Normal => Plain(TextStyle.None),
        Tone.Dim => new Attr(Color.DarkGray, Default),
        Tone.Heading => Plain(TextStyle.Bold),
        Tone.Selected => Plain(TextStyle.Reverse),
        Tone.Good => new Attr(Color.BrightGreen, Default),
        Tone.Bad => new Attr(Color.BrightRed, Default, TextStyle.Bold),
        Tone.SelectedBad => new Attr(Color.BrightRed, Default, TextStyle.Bold | TextStyle.Reverse),
        Tone.Warning => new Attr(Color.BrightYellow, Default),
        Tone.Error => new Attr(Color.BrightRed, Default, TextStyle.Bold),
    };

    private static Attr MonochromeFor(Tone tone) => tone switch
    {
        Tone.Normal or Tone.Good or Tone.Warning => Plain(TextStyle.None),
        Tone.Dim => Plain(TextStyle.Faint),
        Tone.Heading or Tone.Bad or Tone.Error => Plain(TextStyle.Bold),
        Tone.Selected => Plain(TextStyle.Reverse),
        Tone.SelectedBad => Plain(TextStyle.Reverse | TextStyle.Bold),
    };
}
