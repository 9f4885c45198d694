namespace TermLocus.Core.Expressions;

/// <summary>
/// The names the expression language reserves and the rule for parameter names, so the plant-file reader can
/// reject a parameter that could never be referred to.
/// </summary>
public static class ExpressionNames
{
    /// <summary>The Laplace variable of continuous-time expressions.</summary>
    public const string LaplaceVariable = "s";

    /// <summary>The shift variable of sampled-time (z-domain) expressions.</summary>
    public const string ShiftVariable = "z";

    /// <summary>
    /// True for the names the language keeps for itself: <c>s</c>, <c>z</c>, <c>pi</c>, <c>sqrt</c>, <c>exp</c>,
    /// <c>ln</c>, <c>abs</c>. Case-sensitive (<c>S</c> is an ordinary name).
    /// </summary>
    public static bool IsReserved(string name) => IsVariable(name) || name == "pi" || FunctionOf(name) is not null;

    /// <summary>True when <paramref name="name"/> matches <c>[A-Za-z_][A-Za-z0-9_]*</c> and is not reserved.</summary>
    public static bool IsValidParameterName(string name)
    {
        if (string.IsNullOrEmpty(name) || !(char.IsAsciiLetter(name[0]) || name[0] == '_'))
        {
            return false;
        }

        foreach (char c in name)
        {
            if (!(char.IsAsciiLetterOrDigit(c) || c == '_'))
            {
                return false;
            }
        }

        return !IsReserved(name);
    }

    internal static bool IsVariable(string name) => name is LaplaceVariable or ShiftVariable;

    internal static ScalarFunction? FunctionOf(string name) => name switch
    {
        "sqrt" => ScalarFunction.Sqrt,
        "exp" => ScalarFunction.Exp,
        "ln" => ScalarFunction.Ln,
        "abs" => ScalarFunction.Abs,
        _ => null,
    };
}
