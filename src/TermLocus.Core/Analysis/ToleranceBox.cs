using System.Collections.Immutable;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Analysis;

/// <summary>
/// The box spanned by the bands of all toleranced parameters (the swept parameter excluded), and its corners.
/// A box with no axes has exactly one corner: the nominal values themselves.
/// </summary>
public sealed class ToleranceBox
{
    /// <summary>Most axes a box may have: 2^12 = 4096 corners keep a keystroke affordable.</summary>
    public const int MaxAxes = 12;

    /// <summary>Creates a box from its axes. Throws <see cref="ArgumentException"/> for more than <see cref="MaxAxes"/> axes.</summary>
    public ToleranceBox(ImmutableArray<ToleranceAxis> axes)
    {
        if (axes.Length > MaxAxes)
        {
            throw new ArgumentException($"At most {MaxAxes} toleranced parameters are supported, got {axes.Length}.", nameof(axes));
        }

        Axes = axes;
    }

    /// <summary>The axes in file order.</summary>
    public ImmutableArray<ToleranceAxis> Axes { get; }

    /// <summary>2^(number of axes).</summary>
    public int CornerCount => 1 << Axes.Length;

    /// <summary>
    /// The box of <paramref name="plant"/>'s toleranced parameters other than <paramref name="sweptName"/>,
    /// with nominal values taken from <paramref name="values"/> where given (command-line overrides), else the file.
    /// </summary>
    public static ToleranceBox FromPlant(Plant plant, string sweptName, IReadOnlyDictionary<string, double> values)
    {
        var axes = ImmutableArray.CreateBuilder<ToleranceAxis>();
        foreach (var p in plant.Parameters)
        {
            if (p.Band is { } band && p.Name != sweptName)
            {
                double nominal = values.TryGetValue(p.Name, out var v) ? v : p.Value;
                axes.Add(new ToleranceAxis(p.Name, nominal, band));
            }
        }

        return new ToleranceBox(axes.ToImmutable());
    }

    /// <summary>
    /// Corner number <paramref name="index"/> (0 .. CornerCount-1): bit i set puts axis i at its band's high end.
    /// Writes the corner's values into <paramref name="target"/> (the other entries are left alone).
    /// </summary>
    public void WriteCorner(int index, IDictionary<string, double> target)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(index);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(index, CornerCount);
        for (int i = 0; i < Axes.Length; i++)
        {
            var axis = Axes[i];
            target[axis.Name] = ((index >> i) & 1) == 1 ? axis.Band.High : axis.Band.Low;
        }
    }

    /// <summary>The toleranced values of corner <paramref name="index"/>, by name (for reports).</summary>
    public ImmutableDictionary<string, double> Corner(int index)
    {
        var d = new Dictionary<string, double>(StringComparer.Ordinal);
        WriteCorner(index, d);
        return d.ToImmutableDictionary(StringComparer.Ordinal);
    }
}
