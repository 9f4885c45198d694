using System.Collections.Immutable;
using System.Diagnostics.CodeAnalysis;
using TermLocus.Core.Algebra;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Expressions;

/// <summary>
/// An expression read from a plant file, parsed once and evaluated for any parameter values to a rational function
/// of its variable. Immutable and safe to share between threads. Made by <see cref="ExpressionParser.Parse"/>.
/// </summary>
public sealed class ParsedExpression
{
    internal ParsedExpression(
        ExpressionText source, string file, string variable, ExpressionNode root, ImmutableArray<NameUse> names, ImmutableArray<string> distinctNames)
    {
        Source = source;
        File = file;
        Variable = variable;
        Root = root;
        Names = names;
        DistinctNames = distinctNames;
    }

    /// <summary>The text and its file positions.</summary>
    public ExpressionText Source { get; }

    /// <summary>The file named in error messages.</summary>
    public string File { get; }

    /// <summary>The variable: <c>s</c> or <c>z</c>.</summary>
    public string Variable { get; }

    /// <summary>Every use of a parameter name in text order, with its offset, so unknown names can be reported where they stand.</summary>
    public ImmutableArray<NameUse> Names { get; }

    /// <summary>The distinct parameter names, in order of first use.</summary>
    public ImmutableArray<string> DistinctNames { get; }

    /// <summary>True when the variable occurs in the expression.</summary>
    public bool ContainsVariable => Root.ContainsVariable;

    /// <summary>
    /// An upper bound on the degree in the variable of the value's numerator and denominator (fractions formed without
    /// cancellation), at most <see cref="ExpressionLimits.MaxDegree"/>. Exact unless coefficients happen to vanish.
    /// </summary>
    public int DegreeBound => Root.Degree.Max;

    internal ExpressionNode Root { get; }

    internal DegreeBound Degree => Root.Degree;

    /// <summary>
    /// The value for the given parameter values, as numerator over denominator with nothing cancelled: sums are
    /// cross-multiplied (each written fraction keeps its own denominator) and products multiplied out.
    /// </summary>
    /// <param name="values">A finite value for every name in <see cref="DistinctNames"/>; other entries are ignored.</param>
    /// <exception cref="PlantFileException">A name has no value, or the value cannot be formed (division by zero,
    /// a result that is not a finite real number); located at the offending part of the text.</exception>
    public RationalFunction Evaluate(IReadOnlyDictionary<string, double> values)
    {
        ArgumentNullException.ThrowIfNull(values);
        var array = new double[DistinctNames.Length];
        for (int i = 0; i < array.Length; i++)
        {
            if (!values.TryGetValue(DistinctNames[i], out array[i]))
            {
                string name = DistinctNames[i];
                int offset = Names.First(u => u.Name == name).Offset;
                throw new PlantFileException(ErrorAt(offset, $"no value for parameter '{name}'"));
            }
        }

        return Evaluate(new NumericAlgebra(array, null)).ToRationalFunction();
    }

    /// <summary>Like <see cref="Evaluate(IReadOnlyDictionary{string, double})"/>, returning the located error instead of throwing.</summary>
    public bool TryEvaluate(
        IReadOnlyDictionary<string, double> values,
        [NotNullWhen(true)] out RationalFunction? result,
        [NotNullWhen(false)] out PlantFileError? error)
    {
        try
        {
            result = Evaluate(values);
            error = null;
            return true;
        }
        catch (PlantFileException e)
        {
            result = null;
            error = e.Error;
            return false;
        }
    }

    /// <summary>The value in any algebra; algebra failures become located <see cref="PlantFileException"/>s.</summary>
    internal T Evaluate<T>(IExpressionAlgebra<T> algebra)
    {
        try
        {
            return ExpressionEvaluator.Evaluate(Root, algebra);
        }
        catch (ExpressionEvaluationException e)
        {
            throw Located(e);
        }
    }

    /// <summary>Evaluates the parts free of parameters and variable (see <see cref="ConstantCheck"/>).</summary>
    /// <exception cref="PlantFileException">A constant part has no finite real value or divides by zero, located.</exception>
    internal void CheckConstantParts()
    {
        try
        {
            ConstantCheck.Run(Root);
        }
        catch (ExpressionEvaluationException e)
        {
            throw Located(e);
        }
    }

    /// <summary>Offset of the first division by a sub-expression containing the variable, or -1 when there is none.</summary>
    internal int FirstDivisionByVariable() => FirstDivisionByVariable(Root);

    /// <summary>A located error at character <paramref name="offset"/> of the text.</summary>
    internal PlantFileError ErrorAt(int offset, string message) => new(File, Source.PositionOf(offset), message);

    /// <inheritdoc/>
    public override string ToString() => Source.Text;

    private PlantFileException Located(ExpressionEvaluationException e)
    {
        string quote = SourceQuote.Of(Source.Text, e.Site.Start, e.Site.End, 40);
        return new PlantFileException(ErrorAt(e.Site.Start, $"{e.Prefix}'{quote}'{e.Suffix}"));
    }

    private static int FirstDivisionByVariable(ExpressionNode node)
    {
        switch (node)
        {
            case ProductNode p:
                foreach (var f in p.Factors)
                {
                    int inner = f.Divide && f.Node.ContainsVariable ? f.Node.Start : FirstDivisionByVariable(f.Node);
                    if (inner >= 0)
                    {
                        return inner;
                    }
                }

                return -1;
            case SumNode s:
                foreach (var t in s.Terms)
                {
                    int inner = FirstDivisionByVariable(t.Node);
                    if (inner >= 0)
                    {
                        return inner;
                    }
                }

                return -1;
            case NegateNode n:
                return FirstDivisionByVariable(n.Operand);
            case PowerNode pw:
                return FirstDivisionByVariable(pw.Base);
            default:
                return -1;
        }
    }
}
