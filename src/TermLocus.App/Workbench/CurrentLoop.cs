using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Analysis;

namespace TermLocus.App.Workbench;

/// <summary>
/// The loop at the varied parameter's place in its band (every other parameter nominal): its characteristic
/// polynomial as a function of the swept value and its open-loop poles and zeros. At nominal, the plant's own.
/// </summary>
/// <param name="Values">Every parameter's value but the swept one's, by name.</param>
/// <param name="Family">The characteristic polynomial as a function of the swept value.</param>
/// <param name="OpenLoopPoles">Roots of A in P = A + p·B when the family is affine; else empty.</param>
/// <param name="OpenLoopZeros">Roots of B when the family is affine; else empty.</param>
/// <param name="Key">The trace inputs.</param>
public sealed record CurrentLoop(
    ImmutableDictionary<string, double> Values,
    CharacteristicFamily Family,
    ImmutableArray<Complex> OpenLoopPoles,
    ImmutableArray<Complex> OpenLoopZeros,
    TraceKey Key)
{
    /// <summary>The loop at every parameter's nominal value.</summary>
    public static CurrentLoop Nominal(LoadedPlant loaded) => new(
        loaded.Plant.NominalValues(), loaded.Family, loaded.OpenLoopPoles, loaded.OpenLoopZeros, loaded.NominalKey);
}
