namespace TermLocus.App.Workbench;

/// <summary>The swept value could not be saved; the file is unchanged.</summary>
/// <param name="Problem">Why, one line (untrusted text may be inside).</param>
public sealed record OperatingPointSaveFailed(string Problem) : Message;
