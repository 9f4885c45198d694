namespace TermLocus.App.Workbench;

/// <summary>
/// A recovery file found beside a plant file when it was opened: what an abrupt exit kept of an unsaved value.
/// </summary>
/// <param name="Path">The recovery file (<c>&lt;plant file&gt;.recovery</c>).</param>
/// <param name="WrittenUtc">When it was last written (its modification time).</param>
/// <param name="PlantChangedUtc">When the plant file was last written.</param>
/// <param name="Parameter">The swept parameter it holds a value for, or null when it could not be read.</param>
/// <param name="Value">The value it holds, or null when it could not be read or does not fit the plant.</param>
/// <param name="Problem">Why it cannot be applied (unreadable, not a plant file, another swept parameter), or null.</param>
public sealed record RecoveryFile(
    string Path, DateTimeOffset WrittenUtc, DateTimeOffset PlantChangedUtc, string? Parameter, double? Value, string? Problem)
{
    /// <summary>True when the plant file was written after the recovery file: its value may be out of date.</summary>
    public bool Stale => WrittenUtc < PlantChangedUtc;

    /// <summary>True when it holds a value for the plant's swept parameter.</summary>
    public bool CanApply => Problem is null && Value is not null && Parameter is not null;
}
