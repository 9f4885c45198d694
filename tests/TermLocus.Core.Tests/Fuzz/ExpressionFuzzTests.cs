using System.Collections.Immutable;
using CsCheck;
using TermLocus.Core.Algebra;
using TermLocus.Core.Expressions;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Fuzz;

/// <summary>
/// The expression parser alone on token soups and hostile trees: parsing, then evaluating at hostile parameter
/// values, then solving the numerator. Allowed outcomes: a finite rational function whose numerator's roots are
/// finite, or a one-line located <see cref="PlantFileException"/> (plant-file design, "Expressions": errors name the
/// line and column and what was expected). CI runs 1500 soups and 1000 trees (longer on average); TERMLOCUS_FUZZ_ITERATIONS raises both.
/// </summary>
public sealed class ExpressionFuzzTests
{
    private const string File = "soup.toml";

    private static readonly Gen<double> ParameterValue = Gen.Frequency(
        (4, Gen.Double[-100.0, 100.0]),
        (2, Gen.Select(Gen.Int[1, 9], Gen.Int[-320, 308], (m, e) => m * Math.Pow(10.0, e))),
        (1, Gen.OneOfConst(0.0, -0.0, double.Epsilon, double.MaxValue, -double.MaxValue, 1e-308, 1.0)));

    [Fact]
    public void Token_soups_parse_and_evaluate_or_fail_with_a_located_one_line_error() =>
        Run("expression token soup", ExpressionGenerators.TokenSoup, 1500);

    [Fact]
    public void Hostile_expression_trees_parse_and_evaluate_or_fail_with_a_located_one_line_error() =>
        Run("expression trees", ExpressionGenerators.Any, 1000);

    private static void Run(string name, Gen<string> texts, long ciCases)
    {
        using var session = new FuzzSession(name);
        Gen.Select(texts, ParameterValue.Array[12], Gen.Bool).Sample(
            (text, values, shift) => session.Run(
                () => ParseAndEvaluate(text, values, shift ? ExpressionNames.ShiftVariable : ExpressionNames.LaplaceVariable),
                () => $"'{text}' at [{string.Join(", ", values)}]"),
            seed: FuzzSettings.Seed,
            iter: FuzzSettings.Iterations(ciCases),
            threads: FuzzSettings.Threads,
            print: t => $"'{t.Item1}' at [{string.Join(", ", t.Item2)}]");
    }

    private static void ParseAndEvaluate(string text, double[] values, string variable)
    {
        try
        {
            var parsed = ExpressionParser.Parse(ExpressionText.Inline("plant", text), File, variable);
            var assigned = parsed.DistinctNames.Select((n, i) => (n, values[i % values.Length]))
                .ToImmutableDictionary(p => p.n, p => p.Item2, StringComparer.Ordinal);
            var f = parsed.Evaluate(assigned);
            if (f.Numerator.Coefficients.Concat(f.Denominator.Coefficients).Any(c => !double.IsFinite(c)))
            {
                throw new FuzzCaseException($"evaluation gave a coefficient that is not finite: {f}");
            }

            if (f.Numerator.Degree > 0)
            {
                // Roots are all finite, or the root finder says no (false) for a polynomial whose roots may lie past
                // the double range (Fujiwara's bound over 1e300: a leading coefficient negligible next to the rest) or
                // whose coefficients spread over more than 300 decades (its documented limit).
                if (!PolynomialRoots.TryFind(f.Numerator, out var roots)
                    && RootBounds.Log10Fujiwara(f.Numerator) < 300.0 && RootBounds.Log10Spread(f.Numerator) < 300.0)
                {
                    throw new FuzzCaseException($"the roots of {f.Numerator} could not be found");
                }

                foreach (var root in roots)
                {
                    if (!double.IsFinite(root.Real) || !double.IsFinite(root.Imaginary))
                    {
                        throw new FuzzCaseException($"a root is not finite: {root} of {f.Numerator}");
                    }
                }
            }
        }
        catch (PlantFileException e)
        {
            ErrorRules.CheckInline(e, File, text);
        }
    }
}
