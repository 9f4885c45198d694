namespace TermLocus.App.Workbench;

/// <summary>A save wrote nothing because the user must choose first; the file on disk is unchanged.</summary>
/// <param name="Request">The save asked for.</param>
/// <param name="Reason">Why it was refused.</param>
/// <param name="Problem">One line saying why (untrusted text may be inside).</param>
/// <param name="SuggestedPath">A free file name beside the plant for a save under another name.</param>
public sealed record SaveRefused(SaveOperatingPointEffect Request, SaveRefusal Reason, string Problem, string SuggestedPath) : Message;
