using TermLocus.Core.Analysis;

namespace TermLocus.App.Workbench;

/// <summary>
/// The band-wide check at one swept value, the one <c>termlocus check</c> runs: nominal, every corner of the
/// tolerance box and an interior search, and the overshoot simulated at nominal and the corners. It depends on the
/// swept value only (the box always spans every band), and runs off the UI thread.
/// </summary>
/// <param name="SweptValue">The swept value checked.</param>
/// <param name="Result">The check, or null when it could not be run.</param>
/// <param name="Problem">Why it could not be run, or null.</param>
public sealed record BandCheck(double SweptValue, LoopCheckResult? Result, string? Problem) : Message;
