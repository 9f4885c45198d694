namespace TermLocus.App.Workbench;

/// <summary>
/// The choice offered when the plant file cannot be saved into because it changed on disk or is gone: reload it,
/// save under another name, write it again (when gone), or cancel. Nothing is ever overwritten without being asked.
/// </summary>
/// <param name="Reason">What happened to the file (<see cref="FileOnDisk.Changed"/> or <see cref="FileOnDisk.Missing"/>).</param>
/// <param name="Name">The operating point's name the save was asked with.</param>
/// <param name="Note">Its note.</param>
/// <param name="QuitAfter">The save was the answer to the quit question.</param>
/// <param name="SuggestedPath">The file name offered for a save under another name.</param>
public sealed record SaveConflictOverlay(FileOnDisk Reason, string Name, string Note, bool QuitAfter, string SuggestedPath) : Overlay;
