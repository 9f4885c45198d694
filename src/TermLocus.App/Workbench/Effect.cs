namespace TermLocus.App.Workbench;

/// <summary>
/// Work <see cref="Update"/> asks for but does not do itself: file I/O, heavy computation, quitting. An effect runner
/// performs it (off the UI thread where it may be slow) and posts the outcome back as a <see cref="Message"/>.
/// </summary>
public abstract record Effect;
