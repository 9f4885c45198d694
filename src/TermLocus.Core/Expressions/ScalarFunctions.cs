namespace TermLocus.Core.Expressions;

/// <summary>The real functions behind <see cref="ScalarFunction"/>.</summary>
internal static class ScalarFunctions
{
    /// <summary>f(x); NaN or infinity outside the function's domain, for the caller to report.</summary>
    public static double Apply(ScalarFunction function, double x) => function switch
    {
        ScalarFunction.Sqrt => Math.Sqrt(x),
        ScalarFunction.Exp => Math.Exp(x),
        ScalarFunction.Ln => Math.Log(x),
        ScalarFunction.Abs => Math.Abs(x),
        _ => throw new ArgumentOutOfRangeException(nameof(function), function, "Unknown function."),
    };
}
