using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Closed-loop poles of a loop model at a full set of values, as equivalent s-plane poles, with roots lost to
/// infinity (a degree drop) counted rather than reported as huge numbers. In a sampled loop each root z maps to
/// s = ln(z)/T; a root at z = 0 (a deadbeat mode, gone after one sample) has no finite equivalent and meets every
/// pole limit, so it is left out of the list.
/// </summary>
internal sealed class LoopPoles(LoopModel model)
{
    /// <summary>Finite poles and the count of infinite ones. Throws <see cref="PlantFileException"/> when the loop cannot be formed.</summary>
    public (ImmutableArray<Complex> Finite, int Infinite) At(IReadOnlyDictionary<string, double> values)
    {
        var (characteristic, known) = model.CharacteristicAndRoots(values);
        if (characteristic.IsZero)
        {
            throw new PlantFileException(new PlantFileError(model.Plant.Path, new SourcePosition(1, 1),
                "the characteristic polynomial is identically zero at these values"));
        }

        var roots = known ?? PolynomialRoots.FindWithInfinite(characteristic);
        if (!model.Plane.IsSampled)
        {
            return (roots.Finite, roots.InfiniteCount);
        }

        var mapped = roots.Finite.Where(z => z != Complex.Zero).Select(model.Plane.ToEquivalentS)
            .OrderBy(p => p.Real).ThenBy(p => p.Imaginary).ToImmutableArray();
        return (mapped, roots.InfiniteCount);
    }

    /// <summary>Finite poles only (for band searches).</summary>
    public Complex[] Finite(IReadOnlyDictionary<string, double> values) => [.. At(values).Finite];

    /// <summary>Strictly stable: Re(s) &lt; 0.</summary>
    public bool IsStable(Complex pole) => pole.Real < 0.0;
}
