using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.App.Workbench;

/// <summary>
/// The one place where the workbench calls the computation and file components (plant files, loop model, roots,
/// spec checks, locus tracing and facts, saving). Everything else in the workbench sees only its own records.
/// </summary>
internal static partial class CoreBridge
{
    /// <summary>The closed-loop poles of the nominal loop at <paramref name="value"/> and the specs they miss.</summary>
    public static PoleSnapshot PolesAt(LoadedPlant loaded, double value) => PolesAt(loaded, CurrentLoop.Nominal(loaded), value);

    /// <summary>The closed-loop poles of <paramref name="loop"/> at <paramref name="value"/> and the specs they miss. Cheap.</summary>
    public static PoleSnapshot PolesAt(LoadedPlant loaded, CurrentLoop loop, double value)
    {
        var plane = loaded.Plane;
        ImmutableArray<Complex> poles;
        try
        {
            poles = LocusTracer.PolesAt(loop.Family, value);
        }
        catch (PlantFileException e)
        {
            return new PoleSnapshot(value, [], [], "the loop cannot be formed here: " + e.Error.Message) { Plane = plane };
        }
        catch (ArgumentException)
        {
            return new PoleSnapshot(value, [], [], "the characteristic polynomial vanishes here (every s is a root)") { Plane = plane };
        }

        return new PoleSnapshot(value, poles, Misses(loaded.Plant.Specs, poles, plane)) { Plane = plane };
    }

    /// <summary>Every spec the s-plane poles miss, worst relative margin first.</summary>
    public static ImmutableArray<SpecMiss> Misses(Specs specs, ImmutableArray<Complex> poles) => Misses(specs, poles, LoopPlane.Continuous);

    /// <summary>
    /// Every spec the roots miss, judged through their equivalent s (a deadbeat root z = 0 meets every limit), worst
    /// relative margin first; each miss names the root as drawn.
    /// </summary>
    public static ImmutableArray<SpecMiss> Misses(Specs specs, ImmutableArray<Complex> roots, LoopPlane plane)
    {
        var judged = roots.Where(r => plane.MetricsOf(r) is not null).ToList();
        var equivalent = judged.Select(plane.ToEquivalentS).ToList();
        Complex RootOf(Complex s)
        {
            int i = equivalent.IndexOf(s);
            return i >= 0 ? judged[i] : plane.FromEquivalentS(s);
        }

        return SpecCheck.Evaluate(specs, equivalent).Violations
            .Select(v => new SpecMiss(v.Key, v.Limit, v.Actual, v.Margin, RootOf(v.Pole)))
            .OrderBy(m => m.RelativeMargin)
            .ToImmutableArray();
    }

    /// <summary>Reads a plant file and builds its loop at the nominal values. Throws <see cref="PlantFileException"/>.</summary>
    public static LoadedPlant Load(string path) => Build(PlantFileReader.ReadDocument(path));

    /// <summary>Every plant file of <paramref name="folder"/> with its verdict at its saved values.</summary>
    public static ImmutableArray<LibraryItem> ScanLibrary(string folder) =>
        PlantLibrary.Scan(folder).AsParallel().AsOrdered().Select(Item).ToImmutableArray();

    /// <summary>The locus over the plant's range and the swept values worth jumping to (the same study the verbs run).</summary>
    public static LocusAnalysis Trace(LoadedPlant loaded, TraceKey key, CharacteristicFamily? family = null)
    {
        var specs = loaded.Plant.Specs;
        var study = LocusStudy.Run(family ?? loaded.Family, loaded.Plane, loaded.Range, specs);
        var marks = study.SpecBoundaries.Select(b => new SweepMark(b.Value, SweepMarkKind.SpecBoundary, b.Spec.Key(specs)))
            .Concat(study.Facts.AxisCrossings.Select(c => new SweepMark(c.Value, SweepMarkKind.StabilityCrossing, null)))
            .Concat(study.UnitCircleCrossings.Select(c => new SweepMark(c.Value, SweepMarkKind.StabilityCrossing, null)))
            .Concat(study.Facts.BreakPoints.Select(b => new SweepMark(b.Value, SweepMarkKind.BreakPoint, null)))
            .OrderBy(m => m.Value)
            .ToImmutableArray();
        return new LocusAnalysis(key, study.Trace.Branches.Select(b => b.Points).ToImmutableArray(), marks);
    }

    /// <summary>Builds the loop of a plant not read from a file (nothing to save into). Throws <see cref="PlantFileException"/>.</summary>
    public static LoadedPlant FromPlant(Plant plant) => Build(plant, null);

    private static LoadedPlant Build(PlantDocument document) => Build(document.Plant, document);

    private static LoadedPlant Build(Plant plant, PlantDocument? document)
    {
        var model = LoopModel.Create(plant);
        var family = model.Family(plant.Loop.Sweep, plant.NominalValues());
        var range = SweepSpan.For(plant, family, plant.SweptParameter.Value);
        var split = family.Affine;
        return new LoadedPlant(plant, family, range, Roots(split?.A), Roots(split?.B), document, model);
    }

    private static ImmutableArray<Complex> Roots(Polynomial? p) =>
        p is null || p.Degree < 1 ? [] : [.. PolynomialRoots.Find(p)];

    private static LibraryItem Item(PlantLibraryEntry entry)
    {
        if (entry.Plant is not { } plant)
        {
            return new LibraryItem(entry.Path, entry.FileName, null, LibraryVerdict.Error, entry.Error?.ToString());
        }

        try
        {
            // The same check as `termlocus check`: nominal and across the tolerance band.
            var result = LoopCheck.Run(LoopModel.Create(plant), plant.NominalValues());
            var verdict = result.Passed ? LibraryVerdict.Pass : LibraryVerdict.Fail;
            string? problem = result.Passed ? null : result.Violated.FirstOrDefault()?.Key ?? "unstable";
            return new LibraryItem(entry.Path, entry.FileName, entry.Title, verdict, problem);
        }
        catch (Exception e) when (e is PlantFileException or ArgumentException)
        {
            string problem = e is PlantFileException p ? p.Error.ToString() : $"{entry.FileName}: error: {e.Message}";
            return new LibraryItem(entry.Path, entry.FileName, entry.Title, LibraryVerdict.Error, problem);
        }
    }

    private static byte[] SavedBytes(LoadedPlant loaded, double value, string? verdict, SaveContext context, string? name, string? note)
    {
        var document = loaded.Document ?? throw new IOException("this plant was not read from a file");
        return OperatingPointWriter.Apply(document, value, Record(loaded, value, verdict, context, name, note));
    }

    private static OperatingPointRecord Record(
        LoadedPlant loaded, double value, string? verdict, SaveContext context, string? name, string? note)
    {
        string swept = loaded.Plant.Loop.Sweep;
        verdict ??= loaded.Model is null
            ? SpecWording.Verdict(PolesAt(loaded, value), Text.Glyphs.Ascii)
            : SaveVerdict.Of(CheckBand(loaded, value));
        return new OperatingPointRecord(
            string.IsNullOrWhiteSpace(name) ? $"{swept} = {Text.NumberText.Exact(value)}" : name,
            context.Now(),
            context.By,
            [new KeyValuePair<string, double>(swept, value)],
            verdict,
            string.IsNullOrWhiteSpace(note) ? SaveOverlay.DefaultNote : note);
    }
}
