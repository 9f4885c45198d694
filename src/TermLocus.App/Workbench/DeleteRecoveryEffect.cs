namespace TermLocus.App.Workbench;

/// <summary>Delete a recovery file (discarded, or its value saved); answers <see cref="RecoveryDeleted"/>.</summary>
/// <param name="Path">The recovery file.</param>
public sealed record DeleteRecoveryEffect(string Path) : Effect;
