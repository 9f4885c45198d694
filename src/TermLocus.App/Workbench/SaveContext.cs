namespace TermLocus.App.Workbench;

/// <summary>What saving needs from the outside world: the time and who saves.</summary>
/// <param name="Now">The current time (UTC).</param>
/// <param name="By">"user@host" recorded with a saved operating point.</param>
public sealed record SaveContext(Func<DateTimeOffset> Now, string By);
