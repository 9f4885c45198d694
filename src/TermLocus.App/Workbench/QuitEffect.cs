namespace TermLocus.App.Workbench;

/// <summary>End the workbench and restore the terminal.</summary>
public sealed record QuitEffect : Effect;
