using System.Collections.Immutable;

namespace TermLocus.Core.Plants;

/// <summary>One operating point to append to a plant file as a <c>[[operating_points]]</c> record.</summary>
/// <param name="Name">The user's name for the point; any text (escaped when written).</param>
/// <param name="SavedUtc">When it was saved; written as a UTC date-time to the second.</param>
/// <param name="By">Who saved it, usually user@host; any text.</param>
/// <param name="Values">Parameter values in the order to write them; names must be parameters of the file, values
/// finite. The swept parameter is added first when missing.</param>
/// <param name="Verdict">The one-line verdict at save time; any text.</param>
/// <param name="Note">Free text; any text.</param>
public sealed record OperatingPointRecord(
    string Name,
    DateTimeOffset SavedUtc,
    string By,
    ImmutableArray<KeyValuePair<string, double>> Values,
    string Verdict,
    string Note);
