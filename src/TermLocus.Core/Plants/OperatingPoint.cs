using System.Collections.Immutable;

namespace TermLocus.Core.Plants;

/// <summary>One saved <c>[[operating_points]]</c> record.</summary>
/// <param name="Name">User's name for the point, untrusted text.</param>
/// <param name="SavedUtc">When it was saved, or null when absent.</param>
/// <param name="By">user@host that saved it, untrusted text, empty when absent.</param>
/// <param name="Values">Parameter values chosen, by name.</param>
/// <param name="Verdict">The verdict line written at save time, untrusted text.</param>
/// <param name="Note">Free text, untrusted.</param>
public sealed record OperatingPoint(
    string Name,
    DateTimeOffset? SavedUtc,
    string By,
    ImmutableDictionary<string, double> Values,
    string Verdict,
    string Note);
