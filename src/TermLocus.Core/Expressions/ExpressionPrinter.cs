using System.Globalization;
using System.Text;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Expressions;

/// <summary>
/// Writes polynomials and rational functions as text of the expression language, highest power first, numbers in
/// shortest round-trip form (invariant culture). Parsing and evaluating the text gives back exactly the same
/// coefficients.
/// </summary>
public static class ExpressionPrinter
{
    /// <summary>E.g. <c>2*s^2 - 3*s + 1</c>; <c>0</c> for the zero polynomial. Coefficients must be finite.</summary>
    /// <param name="p">The polynomial (ascending coefficients).</param>
    /// <param name="variable">The variable's name, normally <c>s</c> or <c>z</c>.</param>
    public static string Print(Polynomial p, string variable = ExpressionNames.LaplaceVariable)
    {
        ArgumentNullException.ThrowIfNull(p);
        if (p.IsZero)
        {
            return "0";
        }

        var sb = new StringBuilder();
        for (int k = p.Degree; k >= 0; k--)
        {
            double c = p[k];
            if (c == 0.0)
            {
                continue;
            }

            if (sb.Length == 0)
            {
                sb.Append(c < 0 ? "-" : string.Empty);
            }
            else
            {
                sb.Append(c < 0 ? " - " : " + ");
            }

            AppendTerm(sb, Math.Abs(c), k, variable);
        }

        return sb.ToString();
    }

    /// <summary>E.g. <c>(s + 2) / (s^2 + 3*s + 2)</c>; a polynomial denominator of exactly 1 is still written.</summary>
    public static string Print(RationalFunction f, string variable = ExpressionNames.LaplaceVariable)
    {
        ArgumentNullException.ThrowIfNull(f);
        return $"({Print(f.Numerator, variable)}) / ({Print(f.Denominator, variable)})";
    }

    /// <summary>A finite number in shortest round-trip form, invariant culture (e.g. <c>4.7E-06</c>).</summary>
    public static string FormatNumber(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    private static void AppendTerm(StringBuilder sb, double magnitude, int power, string variable)
    {
        bool unit = magnitude == 1.0 && power > 0;
        if (!unit)
        {
            sb.Append(FormatNumber(magnitude));
        }

        if (power == 0)
        {
            return;
        }

        sb.Append(unit ? string.Empty : "*").Append(variable);
        if (power > 1)
        {
            sb.Append('^').Append(power.ToString(CultureInfo.InvariantCulture));
        }
    }
}
