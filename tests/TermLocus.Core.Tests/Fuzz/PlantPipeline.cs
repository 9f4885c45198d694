using System.Collections.Immutable;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Fuzz;

/// <summary>
/// What a plant file goes through when the program opens it: bytes to document, loop model, characteristic
/// polynomial at the nominal values, its roots, and the spec check of those roots. The only allowed outcomes are
/// success, with every root finite, or a <see cref="PlantFileException"/> that keeps <see cref="ErrorRules"/>.
/// Anything else propagates (and fails the fuzz case).
/// </summary>
internal static class PlantPipeline
{
    public const string FileName = "fuzzed.toml";

    private static readonly ImmutableDictionary<string, double> Nominal = ImmutableDictionary<string, double>.Empty;

    /// <summary>Runs <paramref name="bytes"/> through; returns true when the file loaded and was solved.</summary>
    public static bool Run(byte[] bytes)
    {
        try
        {
            var document = PlantFileReader.ParseDocument(bytes, FileName);
            var model = LoopModel.Create(document.Plant);
            var characteristic = model.Characteristic(Nominal);
            var roots = characteristic.Degree > 0 ? PolynomialRoots.Find(characteristic) : [];
            foreach (var root in roots)
            {
                if (!double.IsFinite(root.Real) || !double.IsFinite(root.Imaginary))
                {
                    throw new FuzzCaseException($"a root is not finite: {root} of {characteristic}");
                }
            }

            SpecCheck.Evaluate(document.Plant.Specs, roots);
            return true;
        }
        catch (PlantFileException e)
        {
            ErrorRules.Check(e, FileName, bytes);
            return false;
        }
    }
}
