namespace TermLocus.App.Canvas;

/// <summary>The layer that owns a cell plus an index within that layer (the branch number for
/// <see cref="CellLayer.Branch"/>, otherwise usually 0).</summary>
/// <param name="Layer">What drew the cell.</param>
/// <param name="Index">Which item of the layer, e.g. the branch index; 0 when the layer has no items.</param>
public readonly record struct CellTag(CellLayer Layer, int Index = 0)
{
    /// <summary>An empty cell.</summary>
    public static CellTag None => default;

    /// <summary>The tag of branch <paramref name="index"/>.</summary>
    public static CellTag Branch(int index) => new(CellLayer.Branch, index);

    /// <summary>True when this tag should replace <paramref name="other"/> in a shared cell.</summary>
    public bool Outranks(CellTag other) => Layer > other.Layer;
}
