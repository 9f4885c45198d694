using TermLocus.Core.Algebra;
using TermLocus.Core.Expressions;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Expressions;

/// <summary>Short-hands for parsing and evaluating inline expression text in tests.</summary>
internal static class ExpressionTestText
{
    public const string FileName = "bench.toml";

    public static ParsedExpression Parse(string text, string variable = "s") =>
        ExpressionParser.Parse(ExpressionText.Inline("plant", text), FileName, variable);

    public static RationalFunction Eval(string text, params (string Name, double Value)[] values) =>
        Parse(text).Evaluate(values.ToDictionary(v => v.Name, v => v.Value));

    /// <summary>The value of an expression free of s.</summary>
    public static double Scalar(string text, params (string Name, double Value)[] values)
    {
        var f = Eval(text, values);
        Assert.Equal(0, Math.Max(f.Numerator.Degree, 0));
        Assert.Equal(0, f.Denominator.Degree);
        return f.Numerator[0] / f.Denominator[0];
    }

    /// <summary>The error that parsing <paramref name="text"/> gives.</summary>
    public static PlantFileError ParseError(string text, string variable = "s") =>
        Assert.Throws<PlantFileException>(() => Parse(text, variable)).Error;

    /// <summary>The error that parsing (for constant parts) or else evaluating <paramref name="text"/> gives.</summary>
    public static PlantFileError EvalError(string text, params (string Name, double Value)[] values)
    {
        if (!ExpressionParser.TryParse(ExpressionText.Inline("plant", text), FileName, out var parsed, out var parseError))
        {
            return parseError;
        }

        Assert.False(parsed.TryEvaluate(values.ToDictionary(v => v.Name, v => v.Value), out _, out var error));
        return error;
    }

    public static double[] Coefficients(Polynomial p) => p.Coefficients.ToArray();
}
