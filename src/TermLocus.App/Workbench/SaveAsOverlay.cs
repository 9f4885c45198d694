namespace TermLocus.App.Workbench;

/// <summary>The box to type the file a save under another name writes (a new file; an existing one is never replaced).</summary>
/// <param name="Path">The path as typed (raw; drawn through SafeText), relative to the folder termlocus was started in.</param>
/// <param name="Name">The operating point's name.</param>
/// <param name="Note">Its note.</param>
/// <param name="QuitAfter">Quit once saved.</param>
/// <param name="Problem">Why the last try was refused, or null.</param>
public sealed record SaveAsOverlay(string Path, string Name, string Note, bool QuitAfter, string? Problem) : Overlay
{
    /// <summary>Longest path taken.</summary>
    public const int MaxLength = 1000;
}
