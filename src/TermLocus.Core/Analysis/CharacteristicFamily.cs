using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>
/// The closed loop's characteristic polynomial as a function of the swept parameter, every other parameter fixed.
/// This is all the locus engine needs to know about a loop.
/// </summary>
public abstract class CharacteristicFamily
{
    /// <summary>P(s; p) for swept value <paramref name="p"/>. May drop in degree at isolated values of p.</summary>
    public abstract Polynomial At(double p);

    /// <summary>The split P = A + p·B when P is affine in p, else null.</summary>
    public abstract AffineSplit? Affine { get; }

    /// <summary>A family from an affine split.</summary>
    public static CharacteristicFamily FromAffine(AffineSplit split) => new AffineFamily(split);

    /// <summary>A family from any function (treated as not affine).</summary>
    public static CharacteristicFamily FromFunction(Func<double, Polynomial> at) => new FunctionFamily(at);

    private sealed class AffineFamily(AffineSplit split) : CharacteristicFamily
    {
        public override Polynomial At(double p) => split.At(p);

        public override AffineSplit? Affine => split;
    }

    private sealed class FunctionFamily(Func<double, Polynomial> at) : CharacteristicFamily
    {
        public override Polynomial At(double p) => at(p);

        public override AffineSplit? Affine => null;
    }
}
