namespace TermLocus.App.Workbench;

/// <summary>One row of the key table.</summary>
/// <param name="Key">The key.</param>
/// <param name="Command">What it does.</param>
/// <param name="Scope">Where it applies.</param>
/// <param name="Description">Plain words for help and hints; the same for every key bound to the command in a scope.</param>
public sealed record KeyBinding(KeyChord Key, Command Command, Scope Scope, string Description);
