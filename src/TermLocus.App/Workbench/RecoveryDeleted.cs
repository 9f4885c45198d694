namespace TermLocus.App.Workbench;

/// <summary>A recovery file was deleted, or could not be.</summary>
/// <param name="Path">The recovery file.</param>
/// <param name="Problem">Why it could not be deleted, or null when it is gone.</param>
public sealed record RecoveryDeleted(string Path, string? Problem) : Message;
