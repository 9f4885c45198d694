using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.App.Workbench;

/// <summary>A plant file read and its loop built, at the nominal values of every parameter but the swept one.</summary>
/// <param name="Plant">The plant as read.</param>
/// <param name="Family">The characteristic polynomial as a function of the swept value.</param>
/// <param name="Range">The span to trace: the parameter's range, or an automatic one when the file gives none.</param>
/// <param name="OpenLoopPoles">Poles of the loop (roots of A in P = A + p·B) when the family is affine; else empty.</param>
/// <param name="OpenLoopZeros">Zeros of the loop (roots of B) when the family is affine; else empty.</param>
/// <param name="Document">The file's bytes and hash as read, needed to save into it; null for plants not read from disk.</param>
/// <param name="Model">The parsed loop, for families at other parameter values; null for hand-built plants.</param>
public sealed record LoadedPlant(
    Plant Plant,
    CharacteristicFamily Family,
    Interval Range,
    ImmutableArray<Complex> OpenLoopPoles,
    ImmutableArray<Complex> OpenLoopZeros,
    PlantDocument? Document = null,
    LoopModel? Model = null)
{
    /// <summary>The trace key of the nominal values.</summary>
    public TraceKey NominalKey => TraceKey.For(Plant, Plant.NominalValues());

    /// <summary>The plane of the loop's roots: z for a sampled loop, else s (also for hand-built plants).</summary>
    public LoopPlane Plane => Model?.Plane ?? LoopPlane.Continuous;
}
