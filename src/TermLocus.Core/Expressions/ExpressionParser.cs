using System.Diagnostics.CodeAnalysis;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Expressions;

/// <summary>
/// Reads the expression language of plant files: numbers (<c>12</c>, <c>0.5</c>, <c>4.7e-6</c>), parameter names,
/// the variable (<c>s</c>, or <c>z</c> when asked for), <c>+ - * / ^</c>, unary minus, parentheses, <c>pi</c>, and
/// <c>sqrt exp ln abs</c> of sub-expressions free of the variable. Multiplication is always written out.
/// </summary>
public static class ExpressionParser
{
    /// <summary>Parses <paramref name="text"/>.</summary>
    /// <param name="text">The expression and the file position of each of its characters.</param>
    /// <param name="file">The file named in error messages (as the user gave it).</param>
    /// <param name="variable"><see cref="ExpressionNames.LaplaceVariable"/> (default) or <see cref="ExpressionNames.ShiftVariable"/>.</param>
    /// <exception cref="PlantFileException">A syntax error, printed as FILE:LINE:COL with what was expected; or a
    /// part free of parameters and variable without a finite real value (<c>ln(-1)</c>, <c>1/0</c>, <c>1e200*1e200</c>).</exception>
    /// <exception cref="ArgumentException"><paramref name="variable"/> is neither s nor z.</exception>
    public static ParsedExpression Parse(ExpressionText text, string file, string variable = ExpressionNames.LaplaceVariable)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(file);
        if (!ExpressionNames.IsVariable(variable))
        {
            throw new ArgumentException($"The variable must be 's' or 'z', not '{variable}'.", nameof(variable));
        }

        try
        {
            var parser = new RecursiveDescentParser(text.Text, variable, offset => Describe(text, offset));
            var root = parser.ParseWhole();
            var parsed = new ParsedExpression(text, file, variable, root, parser.Uses, parser.DistinctNames);
            parsed.CheckConstantParts();
            return parsed;
        }
        catch (ExpressionSyntaxException e)
        {
            throw new PlantFileException(new PlantFileError(file, text.PositionOf(e.Offset), e.Message));
        }
    }

    /// <summary>Like <see cref="Parse"/>, returning the located error instead of throwing.</summary>
    public static bool TryParse(
        ExpressionText text,
        string file,
        [NotNullWhen(true)] out ParsedExpression? expression,
        [NotNullWhen(false)] out PlantFileError? error,
        string variable = ExpressionNames.LaplaceVariable)
    {
        try
        {
            expression = Parse(text, file, variable);
            error = null;
            return true;
        }
        catch (PlantFileException e)
        {
            expression = null;
            error = e.Error;
            return false;
        }
    }

    private static string Describe(ExpressionText text, int offset)
    {
        var p = text.PositionOf(offset);
        return $"line {p.Line}, column {p.Column}";
    }
}
