namespace TermLocus.Core.Plants;

/// <summary>A closed real interval [Low, High]; Low &lt;= High, both finite.</summary>
public readonly record struct Interval(double Low, double High)
{
    /// <summary>High - Low.</summary>
    public double Width => High - Low;

    /// <summary>True when Low &lt;= x &lt;= High.</summary>
    public bool Contains(double x) => x >= Low && x <= High;
}
