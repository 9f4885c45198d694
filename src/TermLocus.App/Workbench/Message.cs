namespace TermLocus.App.Workbench;

/// <summary>Something that happened outside <see cref="Update"/>: an effect's outcome, a typed character, a click.</summary>
public abstract record Message;
