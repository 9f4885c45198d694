using System.Collections.Immutable;

namespace TermLocus.App.Workbench;

/// <summary>Simulate the step response; answers <see cref="ResponseView"/>. Only the newest one waiting is run.</summary>
/// <param name="Loaded">The plant and its loop model.</param>
/// <param name="Values">Every parameter's value but the swept one's.</param>
/// <param name="Key">The inputs, with the swept value.</param>
public sealed record SimulateResponseEffect(LoadedPlant Loaded, ImmutableDictionary<string, double> Values, ResponseKey Key) : Effect;
