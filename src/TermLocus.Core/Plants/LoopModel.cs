using System.Collections.Immutable;
using System.Diagnostics.CodeAnalysis;
using System.Globalization;
using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;
using TermLocus.Core.Expressions;

namespace TermLocus.Core.Plants;

/// <summary>
/// The closed loop of a plant file, its expressions parsed once. For given parameter values it forms the
/// characteristic polynomial: the numerator of <c>1 ± L</c> brought to one fraction (minus for positive
/// feedback), with no common factor ever cancelled, or the numerator of the given <c>characteristic</c>.
/// Immutable and safe to share between threads.
/// <list type="bullet">
/// <item>Continuous loop (no <c>sample_time</c>): polynomials in s, L = C·G·H. A transport delay T
/// (<c>delay</c>) stands in the forward path, after the controller: L = C·G·H·P_T, where P_T is the [n/n] Padé
/// approximant of e^{−sT} (<see cref="LoopModelOptions.DelayOrder"/>, default 3), so the locus and the
/// characteristic gain n poles and n right-half-plane zeros. The step response (<see cref="LoopResponse"/>)
/// simulates the delay exactly instead.</item>
/// <item>Sampled loop (<c>sample_time</c> = T &gt; 0): polynomials in z. The controller is written in z and runs
/// every T seconds behind a zero-order hold; plant and sensor stay in s and are discretised exactly together,
/// L = C(z)·(G·H)_hold(z). A delay is exact: whole sample intervals as z^{−k}, a remainder by the modified
/// z-transform (<see cref="Time.ZeroOrderHold.Discretise(RationalFunction, double, double)"/>).</item>
/// </list>
/// <see cref="Plane"/> says which; roots are turned into ζ, ωn and σ through <see cref="LoopPlane.ToEquivalentS"/>.
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

    /// <summary>
    /// The relative accuracy of a sampled loop's hold equivalent below which <see cref="SamplingWarning"/> speaks:
    /// 1e-6, well above the 1e-13 the textbook cases reach, well below what figures are printed to.
    /// </summary>
    public const double SamplingAccuracyLimit = 1e-6;

    private readonly LoopParts parts;
    private readonly ParameterSlots slots;

    private LoopModel(Plant plant, ParameterSlots slots, LoopParts parts, LoopModelOptions options)
    {
        Plant = plant;
        this.slots = slots;
        this.parts = parts;
        Options = options;
        Plane = plant.Loop.SampleTimeSeconds is double t ? LoopPlane.Sampled(t) : LoopPlane.Continuous;
    }

    /// <summary>The plant this model was built from.</summary>
    public Plant Plant { get; }

    /// <summary>True when the file gives the characteristic polynomial itself (then there is no loop gain).</summary>
    public bool HasGivenCharacteristic => parts.Given is not null;

    /// <summary>The plane of every polynomial and root this model gives: s, or z with the sample time.</summary>
    public LoopPlane Plane { get; }

    /// <summary>The transport delay in the loop in seconds (&gt;= 0; 0 when the file gives none).</summary>
    public double DelaySeconds => Plant.Loop.DelaySeconds ?? 0.0;

    /// <summary>The options the model was built with.</summary>
    public LoopModelOptions Options { get; }

    /// <summary>Parses and checks the loop of <paramref name="plant"/> with <see cref="LoopModelOptions.Default"/>.</summary>
    /// <exception cref="PlantFileException">A syntax error, a name not in [parameters], a characteristic with
    /// the variable in a divisor, a loop above degree <see cref="ExpressionLimits.MaxDegree"/>, a controller or
    /// characteristic written in s in a sampled loop, a delay with a given characteristic, or a sampled delay of more
    /// than 1000 sample intervals; located at the character (the start of the plant or characteristic for the last
    /// two).</exception>
    /// <exception cref="ArgumentException">The loop gives both or neither of plant and characteristic, or a delay
    /// or sample time out of range (delay finite and &gt;= 0, sample time finite and &gt; 0).</exception>
    public static LoopModel Create(Plant plant) => Create(plant, LoopModelOptions.Default);

    /// <summary>As <see cref="Create(Plant)"/> with the given options.</summary>
    /// <exception cref="ArgumentOutOfRangeException"><see cref="LoopModelOptions.DelayOrder"/> is outside
    /// [1, <see cref="Time.PadeApproximant.MaximumOrder"/>].</exception>
    public static LoopModel Create(Plant plant, LoopModelOptions options)
    {
        ArgumentNullException.ThrowIfNull(plant);
        ArgumentNullException.ThrowIfNull(options);
        ArgumentOutOfRangeException.ThrowIfLessThan(options.DelayOrder, 1, nameof(options));
        ArgumentOutOfRangeException.ThrowIfGreaterThan(options.DelayOrder, Time.PadeApproximant.MaximumOrder, nameof(options));
        var slots = new ParameterSlots(plant.Parameters);
        return new LoopModel(plant, slots, LoopParts.Bind(plant, slots, options.DelayOrder), options);
    }

    /// <summary>
    /// The characteristic polynomial (ascending coefficients in s, or in z for a sampled loop) at the given values:
    /// its roots are the closed-loop poles, hidden ones included. Not normalised: the leading coefficient is whatever
    /// the fractions give.
    /// </summary>
    /// <exception cref="PlantFileException">The loop cannot be formed at these values, the polynomial is identically
    /// zero, or its roots cannot be computed in double precision (a leading coefficient negligible next to the others,
    /// coefficients spread over hundreds of decades); every polynomial returned has roots that
    /// <see cref="PolynomialRoots.Find(Polynomial)"/> finds.</exception>
    public Polynomial Characteristic(IReadOnlyDictionary<string, double> values) => parts.Characteristic(slots.Resolve(values));

    /// <summary>
    /// The roots of <see cref="Characteristic"/> at the given values, exactly as
    /// <see cref="PolynomialRoots.FindWithInfinite(Polynomial)"/> gives them (finite roots sorted by real then
    /// imaginary part, and the count lost to infinity), with one eigenvalue solve instead of two.
    /// </summary>
    /// <exception cref="PlantFileException">As <see cref="Characteristic"/>.</exception>
    /// <exception cref="ArgumentException">The characteristic polynomial is identically zero.</exception>
    public RootSet CharacteristicRoots(IReadOnlyDictionary<string, double> values)
    {
        var (characteristic, roots) = CharacteristicAndRoots(values);
        return roots ?? PolynomialRoots.FindWithInfinite(characteristic);
    }

    /// <summary>The characteristic polynomial, and its roots when the check on it already found them (else null).</summary>
    internal (Polynomial Characteristic, RootSet? Roots) CharacteristicAndRoots(IReadOnlyDictionary<string, double> values) =>
        parts.CharacteristicAndRoots(slots.Resolve(values));

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

    /// <summary>
    /// The loop gain L, nothing cancelled: C·G·H in s (times the delay's Padé approximant), or C(z)·(G·H)_hold(z) in
    /// z; null when the characteristic is given.
    /// </summary>
    /// <exception cref="PlantFileException">The loop cannot be formed at these values.</exception>
    public RationalFunction? LoopGain(IReadOnlyDictionary<string, double> values) =>
        HasGivenCharacteristic ? null : parts.LoopGain(slots.Resolve(values)).ToRationalFunction();

    /// <summary>
    /// Reference to output, C·G / (1 ± C·G·H) = N_C·N_G·D_H / P, whose denominator is exactly
    /// <see cref="Characteristic"/>; null when the characteristic is given. With a delay in a continuous loop the
    /// forward path carries its Padé approximant too (the view the locus gives; the exact response is
    /// <see cref="LoopResponse"/>). In a sampled loop it is the map from reference samples to output samples,
    /// C·G_hold / (1 ± C·(G·H)_hold), in z.
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
    /// <para>A delay's Padé factor is free of p and keeps an affine loop affine. In a sampled loop the family is
    /// affine when p enters the controller affinely and plant·sensor either not at all or only as an overall factor
    /// (p^a·N(s)/(p^b·D(s)), which the hold passes through unchanged); any other dependence of plant or sensor on p
    /// is not rational in p after the hold, and the numeric family then discretises plant·sensor afresh for every p
    /// (an (n+1)-square matrix exponential and n complex LU solves, O(n⁴) for loop order n; tens of microseconds
    /// for n = 6).</para>
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
    /// Closed-loop poles hidden by a pole-zero cancellation inside the loop gain: the common roots of the numerators
    /// and denominators of C, G and H (in a sampled loop: of C(z) and (G·H)_hold(z), in z; a Padé factor never counts)
    /// (matched one to one within <see cref="HiddenPoleRelativeTolerance"/>), each once
    /// per cancelled pair, sorted by real then imaginary part. Every one is also a root of <see cref="Characteristic"/>.
    /// Empty when the characteristic is given or the loop gain is zero.
    /// </summary>
    /// <exception cref="PlantFileException">The loop cannot be formed at these values.</exception>
    public ImmutableArray<Complex> HiddenPoles(IReadOnlyDictionary<string, double> values) =>
        HasGivenCharacteristic ? [] : parts.HiddenPoles(slots.Resolve(values), HiddenPoleRelativeTolerance);

    /// <summary>
    /// A warning when a sampled loop's polynomials in z cannot hold plant·sensor accurately at these values: the
    /// estimate <see cref="Time.ZeroOrderHold.AccuracyEstimate"/> of G·H held over the sample time is worse than
    /// <see cref="SamplingAccuracyLimit"/> (the sample time is very short beside the loop's time constants, so all
    /// poles crowd near z = 1). Null when the estimate is within the limit, the loop is continuous, or the
    /// characteristic is given.
    /// </summary>
    /// <exception cref="PlantFileException">The loop cannot be formed at these values.</exception>
    public string? SamplingWarning(IReadOnlyDictionary<string, double> values)
    {
        if (parts.Path is not SampledLoopPath sampled || Plane.SampleTimeSeconds is not double t)
        {
            return null;
        }

        double estimate = Time.ZeroOrderHold.AccuracyEstimate(sampled.PlantAndSensor(slots.Resolve(values)), t);
        return estimate <= SamplingAccuracyLimit
            ? null
            : string.Create(
                CultureInfo.InvariantCulture,
                $"sample time {t:G6} s is short for this loop: the z-plane polynomials keep only about {estimate:0.#e+0} relative accuracy near z = 1 (slow modes, steady state); sample slower or simplify the plant");
    }

    /// <summary>The forward path C·G and feedback path H in s, without any delay; null unless the loop is continuous and built from parts.</summary>
    internal (RationalFunction Forward, RationalFunction Feedback)? DelayFreePaths(IReadOnlyDictionary<string, double> values) =>
        parts.Path is ContinuousLoopPath continuous ? continuous.DelayFreePaths(slots.Resolve(values)) : null;

    /// <summary>Controller, plant, sensor and held plant·sensor denominator; null unless the loop is sampled and built from parts.</summary>
    /// <exception cref="PlantFileException">The loop cannot be formed at these values.</exception>
    internal SampledLoopParts? SampledParts(IReadOnlyDictionary<string, double> values) =>
        parts.Path is SampledLoopPath sampled ? sampled.Parts(slots.Resolve(values)) : null;

    /// <summary>True for positive feedback (1 − L).</summary>
    internal bool IsPositiveFeedback => parts.Feedback == FeedbackSign.Positive;
}
