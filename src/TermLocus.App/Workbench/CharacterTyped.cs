namespace TermLocus.App.Workbench;

/// <summary>A printable character was typed while the value box is open.</summary>
/// <param name="Character">The character.</param>
public sealed record CharacterTyped(char Character) : Message;
