using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.App.Workbench;

/// <summary>
/// The one place where the workbench calls the computation and file components (plant files, loop model, roots,
/// spec checks, locus tracing). Everything else in the workbench sees only its own records.
/// </summary>
internal static class CoreBridge
{
    /// <summary>The closed-loop poles at <paramref name="value"/> and the specs they miss. Pure and cheap.</summary>
    public static PoleSnapshot PolesAt(LoadedPlant loaded, double value)
    {
        var characteristic = loaded.Family.At(value);
        ImmutableArray<Complex> poles = characteristic.Degree <= 0 ? [] : [.. PolynomialRoots.Find(characteristic)];
        return new PoleSnapshot(value, poles, CheckSpecs(loaded, poles));
    }

    // PENDING(roots): SpecCheck.Evaluate(specs, poles) replaces this when the roots branch lands.
    private static ImmutableArray<SpecMiss> CheckSpecs(LoadedPlant loaded, ImmutableArray<Complex> poles)
    {
        _ = loaded;
        _ = poles;
        return [];
    }

    // PENDING(plantfile, expr): PlantFileReader.Read + LoopModel.Create.
    public static LoadedPlant Load(string path) =>
        throw new NotSupportedException($"reading plant files arrives with the plant-file reader ({path})");

    // PENDING(plantfile): PlantLibrary.Scan.
    public static ImmutableArray<LibraryItem> ScanLibrary(string folder) =>
        throw new NotSupportedException($"scanning a library arrives with the plant-file reader ({folder})");

    // PENDING(locus): LocusTracer.Trace + LocusFacts + SpecBoundaries.
    public static LocusAnalysis Trace(LoadedPlant loaded, TraceKey key) =>
        throw new NotSupportedException($"tracing arrives with the locus engine ({loaded.Plant.Path}, {key.OtherValues})");

    // PENDING(plantfile): OperatingPointWriter + AtomicFileSaver. Writes to targetPath (the plant file itself, or the
    // recovery file beside it) and returns the plant as now saved.
    public static Core.Plants.Plant SaveOperatingPoint(
        Core.Plants.Plant plant, double value, string verdict, SaveContext context, string targetPath) =>
        throw new NotSupportedException($"saving arrives with the plant-file writer ({targetPath}, {value}, {verdict}, {context.By}, {plant.Path})");
}
