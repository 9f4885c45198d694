using System.Numerics;

namespace TermLocus.App.Plot;

/// <summary>A closed-loop pole at the parameter value being looked at.</summary>
/// <param name="Position">Where it is.</param>
/// <param name="ViolatesSpecs">True when it breaks a spec limit; it then gets its own glyph, not just a colour.</param>
public readonly record struct CurrentPole(Complex Position, bool ViolatesSpecs = false);
