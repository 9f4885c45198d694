using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>
/// The direction a branch leaves a complex open-loop pole (departure) or arrives at a complex open-loop zero
/// (arrival), from the angle condition. For arrival it is the angle of the line from the zero to the arriving branch.
/// A pole or zero of multiplicity q has q directions, one entry each.
/// </summary>
/// <param name="At">The open-loop pole or zero, rad/s.</param>
/// <param name="AngleDegrees">The direction in degrees in (-180, 180], measured from the positive real axis.</param>
/// <param name="Sign">The sign of the swept value this direction applies to.</param>
public sealed record AngleConditionDirection(Complex At, double AngleDegrees, LocusGainSign Sign);
