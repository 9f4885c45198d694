using System.Collections.Immutable;

namespace TermLocus.Core.Time;

/// <summary>
/// A sampled response: <see cref="Times"/> in seconds, strictly increasing from 0, and <see cref="Outputs"/>
/// (the output at each time, in the output's units), of equal length.
/// </summary>
/// <param name="Times">Sample times in seconds, ascending, the first one 0.</param>
/// <param name="Outputs">The output at each sample time.</param>
public sealed record ResponseTrace(ImmutableArray<double> Times, ImmutableArray<double> Outputs)
{
    /// <summary>The number of samples.</summary>
    public int Count => Times.Length;
}
