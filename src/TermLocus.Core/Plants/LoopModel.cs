using System.Collections.Immutable;
using System.Diagnostics.CodeAnalysis;
using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;
using TermLocus.Core.Expressions;

namespace TermLocus.Core.Plants;

/// <summary>
/// The closed loop of a plant file, its expressions parsed once. For given parameter values it forms the
/// characteristic polynomial: the numerator of <c>1 ± C·G·H</c> brought to one fraction (minus for positive
/// feedback), with no common factor ever cancelled, or the numerator of the given <c>characteristic</c>.
/// Immutable and safe to share between threads. Transport delay and sample time are not applied here.
/// </summary>
/// <remarks>
/// Parameter values: every method takes a dictionary of values by parameter name; names left out take their
/// nominal <see cref="Parameter.Value"/>. A name that is not a parameter, or a value that is not finite, is an
/// <see cref="ArgumentException"/>. A value the loop cannot be formed at (division by zero, overflow) is a
/// <see cref="PlantFileException"/> located at the part of the expression that failed.
/// </remarks>
public sealed class LoopModel
{
    /// <summary>
    /// Two roots, one of a numerator and one of a denominator of C, G or H, count as the same (a cancelled, hidden
    /// pole) when they differ by at most this times max(1, |root|). Roots found numerically carry errors near
    /// 1e-16 for simple roots and near 1e-8 for double ones, so 1e-6 catches those while keeping a genuine pole-zero
    /// pair a thousandth of a percent apart distinct. Triple or higher roots inside one factor may be missed.
    /// </summary>
    public const double HiddenPoleRelativeTolerance = 1e-6;

    private readonly LoopParts parts;
    private readonly ParameterSlots slots;

    private LoopModel(Plant plant, ParameterSlots slots, LoopParts parts)
    {
        Plant = plant;
        this.slots = slots;
        this.parts = parts;
    }

    /// <summary>The plant this model was built from.</summary>
    public Plant Plant { get; }

    /// <summary>True when the file gives the characteristic polynomial itself (then there is no loop gain).</summary>
    public bool HasGivenCharacteristic => parts.Given is not null;

    /// <summary>Parses and checks the loop of <paramref name="plant"/>.</summary>
    /// <exception cref="PlantFileException">A syntax error, a name not in [parameters], a characteristic with
    /// s in a divisor, or a loop above degree <see cref="ExpressionLimits.MaxDegree"/>; located at the character.</exception>
    /// <exception cref="ArgumentException">The loop gives both or neither of plant and characteristic.</exception>
    public static LoopModel Create(Plant plant)
    {
        ArgumentNullException.ThrowIfNull(plant);
        var slots = new ParameterSlots(plant.Parameters);
        return new LoopModel(plant, slots, LoopParts.Bind(plant, slots));
    }

    /// <summary>
    /// The characteristic polynomial (ascending coefficients in s) at the given values: its roots are the closed-loop
    /// poles, hidden ones included. Not normalised: the leading coefficient is whatever the fractions give.
    /// </summary>
    /// <exception cref="PlantFileException">The loop cannot be formed at these values, the polynomial is identically
    /// zero, or its roots cannot be computed in double precision (a leading coefficient negligible next to the others,
    /// coefficients spread over hundreds of decades); every polynomial returned has roots that
    /// <see cref="PolynomialRoots.Find(Polynomial)"/> finds.</exception>
    public Polynomial Characteristic(IReadOnlyDictionary<string, double> values) => parts.Characteristic(slots.Resolve(values));

    /// <summary>Like <see cref="Characteristic"/>, returning the located error instead of throwing.</summary>
    public bool TryCharacteristic(
        IReadOnlyDictionary<string, double> values,
        [NotNullWhen(true)] out Polynomial? characteristic,
        [NotNullWhen(false)] out PlantFileError? error)
    {
        try
        {
            characteristic = Characteristic(values);
            error = null;
            return true;
        }
        catch (PlantFileException e)
        {
            characteristic = null;
            error = e.Error;
            return false;
        }
    }

    /// <summary>The loop gain C·G·H, nothing cancelled; null when the characteristic is given.</summary>
    /// <exception cref="PlantFileException">The loop cannot be formed at these values.</exception>
    public RationalFunction? LoopGain(IReadOnlyDictionary<string, double> values) =>
        HasGivenCharacteristic ? null : parts.LoopGain(slots.Resolve(values)).ToRationalFunction();

    /// <summary>
    /// Reference to output, C·G / (1 ± C·G·H) = N_C·N_G·D_H / P, whose denominator is exactly
    /// <see cref="Characteristic"/>; null when the characteristic is given.
    /// </summary>
    /// <exception cref="PlantFileException">The loop cannot be formed at these values.</exception>
    public RationalFunction? ReferenceToOutput(IReadOnlyDictionary<string, double> values) =>
        HasGivenCharacteristic ? null : parts.ReferenceToOutput(slots.Resolve(values));

    /// <summary>
    /// The characteristic polynomial as a function of the parameter <paramref name="sweptName"/>, every other parameter
    /// at <paramref name="values"/>. Affine (<see cref="CharacteristicFamily.Affine"/> set, P = A + p·B) exactly when
    /// evaluating with p kept symbolic gives coefficients of degree one in p; otherwise (p squared, in two factors,
    /// under a function, or not entering at all) a numeric family that re-forms the loop for each p.
    /// Before the check, a power p^m dividing the whole polynomial (which a parameter under a fraction bar brings,
    /// e.g. <c>(1/J)/(s*(s + B/J))</c> gives J·(J s^2 + B s + K)) is divided out: the affine family's
    /// <c>At(p)</c> is then <see cref="Characteristic"/> / p^m, with the same roots for every p != 0 and a
    /// meaningful limit at p = 0. A numeric family's <c>At(p)</c> equals <see cref="Characteristic"/>.
    /// </summary>
    /// <exception cref="ArgumentException"><paramref name="sweptName"/> is not a parameter.</exception>
    /// <exception cref="PlantFileException">A part free of p cannot be formed at these values. The family's
    /// <c>At</c> throws it for a p at which the loop cannot be formed.</exception>
    public CharacteristicFamily Family(string sweptName, IReadOnlyDictionary<string, double> values)
    {
        int swept = slots.SlotOf(sweptName);
        double[] resolved = slots.Resolve(values);
        var split = parts.AffineSplit(resolved, swept);
        return split is not null
            ? CharacteristicFamily.FromAffine(split)
            : CharacteristicFamily.FromFunction(parts.NumericFamily(resolved, swept));
    }

    /// <summary>
    /// Closed-loop poles hidden by a pole-zero cancellation inside C·G·H: the common roots of the numerators and
    /// denominators of C, G and H (matched one to one within <see cref="HiddenPoleRelativeTolerance"/>), each once
    /// per cancelled pair, sorted by real then imaginary part. Every one is also a root of <see cref="Characteristic"/>.
    /// Empty when the characteristic is given or the loop gain is zero.
    /// </summary>
    /// <exception cref="PlantFileException">The loop cannot be formed at these values.</exception>
    public ImmutableArray<Complex> HiddenPoles(IReadOnlyDictionary<string, double> values) =>
        HasGivenCharacteristic ? [] : parts.HiddenPoles(slots.Resolve(values), HiddenPoleRelativeTolerance);
}
