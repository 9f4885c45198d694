using System.Collections.Immutable;

namespace TermLocus.App.Workbench;

/// <summary>The plant file on disk was compared with the bytes loaded.</summary>
/// <param name="Path">The plant file.</param>
/// <param name="ExpectedSha256">The hash it was compared with (a check made against an older save is ignored).</param>
/// <param name="State">How the file compares.</param>
/// <param name="SuggestedPath">A free file name beside it for a save under another name (e.g. <c>name.2.toml</c>).</param>
public sealed record PlantFileChecked(string Path, ImmutableArray<byte> ExpectedSha256, FileOnDisk State, string SuggestedPath) : Message;
