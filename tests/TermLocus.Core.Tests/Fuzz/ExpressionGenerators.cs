using CsCheck;

namespace TermLocus.Core.Tests.Fuzz;

/// <summary>CsCheck generators of expression text: well-formed trees with hostile leaves, and token soups.</summary>
internal static class ExpressionGenerators
{
    private const int MaxTreeDepth = 6;

    private static readonly string[] Names = ["Kp", "Kt", "J", "B", "wi", "tau_i", "s", "s", "s", "pi", "K", "unknown_name"];

    private static readonly Gen<string> Number = Gen.Frequency(
        (4, Gen.Double[-1000.0, 1000.0].Select(d => d.ToString("R", System.Globalization.CultureInfo.InvariantCulture))),
        (2, Gen.Select(Gen.Int[1, 9], Gen.Int[-330, 330], (m, e) => $"{m}e{e}")),
        (2, Gen.Int[0, 12].Select(i => i.ToString(System.Globalization.CultureInfo.InvariantCulture))),
        (1, Gen.OneOfConst(HostileTokens.Numbers)));

    private static readonly Gen<string> Exponent = Gen.Frequency(
        (6, Gen.Int[0, 6].Select(i => i.ToString(System.Globalization.CultureInfo.InvariantCulture))),
        (1, Gen.OneOfConst("200", "201", "100000", "-1", "-100000", "0.5", "1e300", "(1/2)", "(-1)", "2^2^2^2", "Kp")));

    private static readonly Gen<string>[] Trees = BuildTrees();

    /// <summary>Well-formed expressions (mostly) with hostile numbers, powers and functions at the leaves.</summary>
    public static Gen<string> Tree => Trees[MaxTreeDepth];

    /// <summary>Random sequences of expression tokens, most of them not well-formed.</summary>
    public static readonly Gen<string> TokenSoup = Gen.Select(
        Gen.Frequency((3, Gen.OneOfConst(HostileTokens.ExpressionTokens)), (1, Number)).Array[0, 40],
        Gen.Bool,
        (tokens, spaced) => string.Join(spaced ? " " : "", tokens));

    /// <summary>A tree or a soup, sometimes with a run of nesting or a long repetition wrapped round it.</summary>
    public static readonly Gen<string> Any = Gen.Frequency(
        (5, Tree),
        (3, TokenSoup),
        (1, Gen.Select(Tree, Gen.Int[1, 400], Gen.OneOfConst("(", "-", "sqrt(", "-("), (t, n, open) =>
            string.Concat(Enumerable.Repeat(open, n)) + t + new string(')', open.Count(c => c == '(') * n))),
        (1, Gen.Select(Tree, Gen.Int[2, 2000], Gen.OneOfConst(" + ", " * ", " / ", "^"), (t, n, op) =>
            string.Join(op, Enumerable.Repeat(t, n)))));

    private static Gen<string>[] BuildTrees()
    {
        var trees = new Gen<string>[MaxTreeDepth + 1];
        var leaf = Gen.Frequency((3, Gen.OneOfConst(Names)), (2, Number));
        trees[0] = leaf;
        for (int depth = 1; depth <= MaxTreeDepth; depth++)
        {
            var sub = trees[depth - 1];
            trees[depth] = Gen.Frequency(
                (3, leaf),
                (4, Gen.Select(sub, Gen.OneOfConst(" + ", " - ", "*", " / "), sub, (a, op, b) => a + op + b)),
                (2, sub.Select(a => "(" + a + ")")),
                (1, sub.Select(a => "-" + a)),
                (1, Gen.Select(sub, Exponent, (a, e) => "(" + a + ")^" + e)),
                (1, Gen.Select(Gen.OneOfConst("sqrt", "exp", "ln", "abs"), sub, (f, a) => f + "(" + a + ")")));
        }

        return trees;
    }
}
