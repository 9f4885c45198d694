using System.Collections.Immutable;

namespace TermLocus.App.Workbench;

/// <summary>
/// Compare the plant file on disk with the bytes loaded; answers <see cref="PlantFileChecked"/>. Asked when another
/// program touched the file and when the save dialog opens.
/// </summary>
/// <param name="Path">The plant file.</param>
/// <param name="ExpectedSha256">SHA-256 of the bytes loaded (or saved) last.</param>
public sealed record CheckPlantFileEffect(string Path, ImmutableArray<byte> ExpectedSha256) : Effect;
