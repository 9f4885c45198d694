namespace TermLocus.App.Canvas;

/// <summary>How many dots a cell holds for each symbol set and which character shows a given set of dots.</summary>
internal static class DotCells
{
    /// <summary>First braille pattern; U+2800 itself (no dots) is never emitted, empty cells are spaces.</summary>
    public const char BrailleBase = '\u2800';

    // Braille dot numbering 1..8 -> bit 0..7: dots 1,2,3 run down the left column, 4,5,6 down the right,
    // 7 and 8 are the bottom row added by 8-dot braille (Unicode chart for U+2800..U+28FF).
    private static readonly byte[] BrailleMasks =
    [
        0x01, 0x08, // row 0: dot 1, dot 4
        0x02, 0x10, // row 1: dot 2, dot 5
        0x04, 0x20, // row 2: dot 3, dot 6
        0x40, 0x80, // row 3: dot 7, dot 8
    ];

    // ASCII cell bits: 1 top-left, 2 top-right, 4 bottom-left, 8 bottom-right. A single Bresenham line puts at most
    // two dots in a 2x2 cell, so the three- and four-dot patterns only occur where lines cross: '+'.
    private const string AsciiChars = " ''-.|/+.\\|+_+++";

    /// <summary>Both symbol sets are two dots wide.</summary>
    public const int DotsPerColumn = 2;

    public static int DotsPerRow(CanvasSymbols symbols) => symbols == CanvasSymbols.Braille ? 4 : 2;

    public static byte Mask(CanvasSymbols symbols, int subX, int subY) =>
        symbols == CanvasSymbols.Braille ? BrailleMasks[(subY * 2) + subX] : (byte)(1 << ((subY * 2) + subX));

    public static char Character(CanvasSymbols symbols, byte bits)
    {
        if (bits == 0)
        {
            return ' ';
        }

        return symbols == CanvasSymbols.Braille ? (char)(BrailleBase + bits) : AsciiChars[bits & 0x0F];
    }
}
