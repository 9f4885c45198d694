using System.Collections.Immutable;
using TermLocus.App.Text;
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
    /// <see cref="UsageException"/> for an override naming no parameter, or putting a toleranced parameter outside
    /// its band (the file reader refuses such a value too, and the band check would judge a box the value is not in).
    /// A value outside a parameter's <c>range</c> is allowed: the range is only the span the locus is drawn over.
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
            var parameter = plant.FindParameter(name)
                ?? throw new UsageException($"--set {name}: {file} has no parameter '{name}'");
            double value = overrides[name];
            if (parameter.Band is { } band && !band.Contains(value))
            {
                throw new UsageException(
                    $"--set {name}={NumberText.Exact(value)}: outside the band [{NumberText.Exact(band.Low)}, {NumberText.Exact(band.High)}] "
                    + $"of '{name}' in {file}; a toleranced value must lie in its band");
            }
        }

        var model = LoopModel.Create(plant);
        return new PlantInput(file, plant, model, plant.NominalValues().SetItems(overrides), document);
    }
}
