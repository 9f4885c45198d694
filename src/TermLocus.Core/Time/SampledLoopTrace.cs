namespace TermLocus.Core.Time;

/// <summary>
/// The unit-step response of a sampled loop (<see cref="HeldLoopResponse"/>): the plant output between the sample
/// instants and at them.
/// </summary>
/// <param name="BetweenSamples">The plant output at t = k·T + j·T/P, k = 0..N − 2, j = 0..P − 1, and at the last
/// instant (N − 1)·T: (N − 1)·P + 1 points, seconds from the step. Every P-th point is a sample instant.</param>
/// <param name="AtSamples">The plant output at the N sample instants k·T alone (the same values as every P-th point of
/// <paramref name="BetweenSamples"/>).</param>
/// <param name="PointsPerSample">P, the points per sample interval (&gt;= 1).</param>
public sealed record SampledLoopTrace(ResponseTrace BetweenSamples, ResponseTrace AtSamples, int PointsPerSample);
