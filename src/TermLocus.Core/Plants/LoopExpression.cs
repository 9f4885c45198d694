using TermLocus.Core.Expressions;

namespace TermLocus.Core.Plants;

/// <summary>
/// One expression of a loop bound to the plant's parameters: each name it uses is resolved once to a slot of the
/// parameter array, so evaluating needs no dictionary look-ups.
/// </summary>
internal sealed class LoopExpression
{
    private readonly int[] slotOfName;

    private LoopExpression(ParsedExpression parsed, int[] slotOfName)
    {
        Parsed = parsed;
        this.slotOfName = slotOfName;
    }

    public ParsedExpression Parsed { get; }

    /// <summary>Parses <paramref name="text"/> in <paramref name="variable"/> (s or z) and resolves its names to slots.</summary>
    /// <exception cref="PlantFileException">A syntax error, or a name that is not in [parameters] (located at its first use).</exception>
    public static LoopExpression Bind(
        ExpressionText text, string file, IReadOnlyDictionary<string, int> slotByName, string variable = ExpressionNames.LaplaceVariable)
    {
        var parsed = ExpressionParser.Parse(text, file, variable);
        var slots = new int[parsed.DistinctNames.Length];
        for (int i = 0; i < slots.Length; i++)
        {
            string name = parsed.DistinctNames[i];
            if (!slotByName.TryGetValue(name, out slots[i]))
            {
                int offset = parsed.Names.First(u => u.Name == name).Offset;
                throw new PlantFileException(parsed.ErrorAt(offset, UnknownName(name, slotByName.Keys)));
            }
        }

        return new LoopExpression(parsed, slots);
    }

    /// <summary>True when the expression uses the parameter in <paramref name="slot"/>.</summary>
    public bool Uses(int slot) => Array.IndexOf(slotOfName, slot) >= 0;

    /// <summary>The value for the parameter values in <paramref name="slots"/>.</summary>
    /// <exception cref="PlantFileException">Division by zero or a non-finite result, located.</exception>
    public Fraction Evaluate(double[] slots) => Parsed.Evaluate(new NumericAlgebra(slots, slotOfName));

    /// <summary>The value with the parameter in <paramref name="sweptSlot"/> kept symbolic; null when not polynomial in it.</summary>
    /// <exception cref="PlantFileException">A division by a sub-expression that is zero whatever the swept value.</exception>
    public SweptFraction? EvaluateSwept(double[] slots, int sweptSlot) =>
        Parsed.Evaluate(new SweptAlgebra(slots, slotOfName, sweptSlot));

    private static string UnknownName(string name, IEnumerable<string> known)
    {
        string shown = name.Length <= 40 ? name : name[..37] + "...";
        string? near = NameSuggestion.Closest(name, known);
        string hint = near is null ? string.Empty : $"; did you mean '{near}'?";
        return $"unknown parameter '{shown}': it is not in [parameters]{hint}";
    }
}
