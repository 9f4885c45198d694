namespace TermLocus.App.Workbench;

/// <summary>The choice offered when an opened plant has a recovery file beside it: apply it, discard it, or keep it.</summary>
/// <param name="File">The recovery file found.</param>
public sealed record RecoveryOverlay(RecoveryFile File) : Overlay;
