namespace TermLocus.App.Workbench;

/// <summary>One plant file of the library as the list shows it.</summary>
/// <param name="Path">Full path of the file.</param>
/// <param name="FileName">File name without folder (untrusted: sanitise before drawing).</param>
/// <param name="Title">The plant's title (untrusted), or null when the file did not load.</param>
/// <param name="Verdict">Pass, fail, or error.</param>
/// <param name="Problem">For <see cref="LibraryVerdict.Error"/>, the located error line; for a fail, the worst
/// violation in words; else null.</param>
public sealed record LibraryItem(string Path, string FileName, string? Title, LibraryVerdict Verdict, string? Problem);
