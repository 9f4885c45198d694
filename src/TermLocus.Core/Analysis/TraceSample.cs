using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>All poles at one sampled value; <see cref="Roots"/> in the solver's order, not yet aligned to branches.</summary>
internal sealed record TraceSample(double U, double P, Complex[] Roots);
