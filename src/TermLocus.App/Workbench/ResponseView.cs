using TermLocus.Core.Plants;

namespace TermLocus.App.Workbench;

/// <summary>A simulated closed-loop step response for one set of values (a message when it arrives).</summary>
/// <param name="Key">Its inputs.</param>
/// <param name="Response">The response and its figures, or null when the loop could not be formed.</param>
/// <param name="Problem">Why there is no response, or null.</param>
public sealed record ResponseView(ResponseKey Key, LoopResponse? Response, string? Problem) : Message;
