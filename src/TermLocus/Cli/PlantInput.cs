using System.Collections.Immutable;
using TermLocus.Core.Plants;

namespace TermLocus.Cli;

/// <summary>A plant file read for a verb, its loop built, and the values to use (nominal, then --set overrides).</summary>
/// <param name="File">The path as the user typed it.</param>
/// <param name="Plant">The plant.</param>
/// <param name="Model">Its loop model.</param>
/// <param name="Values">Every parameter's value, overrides applied.</param>
/// <param name="Document">The file's bytes and hash as read (for saving back).</param>
internal sealed record PlantInput(string File, Plant Plant, LoopModel Model, ImmutableDictionary<string, double> Values, PlantDocument Document)
{
    /// <summary>
    /// Reads and builds <paramref name="file"/>. Throws <see cref="PlantFileException"/> for a bad file and
    /// <see cref="UsageException"/> for an override naming no parameter.
    /// </summary>
    public static PlantInput Load(string file, IReadOnlyDictionary<string, double> overrides)
    {
        if (Directory.Exists(file))
        {
            throw new UsageException($"{file} is a folder; name a plant file");
        }

        if (!System.IO.File.Exists(file))
        {
            throw new PlantFileException(new PlantFileError(file, new SourcePosition(1, 1), "no such file"));
        }

        var document = PlantFileReader.ReadDocument(file);
        var plant = document.Plant;
        foreach (var name in overrides.Keys)
        {
            if (plant.FindParameter(name) is null)
            {
                throw new UsageException($"--set {name}: {file} has no parameter '{name}'");
            }
        }

        var model = LoopModel.Create(plant);
        return new PlantInput(file, plant, model, plant.NominalValues().SetItems(overrides), document);
    }
}
