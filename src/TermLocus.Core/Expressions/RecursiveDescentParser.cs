using System.Collections.Immutable;
using System.Runtime.CompilerServices;

namespace TermLocus.Core.Expressions;

/// <summary>
/// Recursive-descent parser for the expression grammar:
/// <code>
/// sum     := product (('+' | '-') product)*
/// product := unary (('*' | '/') unary)*
/// unary   := '-' unary | power
/// power   := primary ('^' unary)?          (right-associative through unary)
/// primary := number | name | variable | 'pi' | function '(' sum ')' | '(' sum ')'
/// </code>
/// Every level of nesting passes through <see cref="ParseUnary"/>, which counts the depth.
/// </summary>
internal sealed class RecursiveDescentParser
{
    private readonly string text;
    private readonly string variable;
    private readonly List<Token> tokens;
    private readonly List<NameUse> uses = [];
    private readonly Dictionary<string, int> nameIndex = new(StringComparer.Ordinal);
    private readonly List<string> distinctNames = [];
    private readonly Func<int, string> describePosition;
    private int position;
    private int depth;

    /// <param name="text">The expression text.</param>
    /// <param name="variable">The variable's name: "s" or "z".</param>
    /// <param name="describePosition">Turns an offset into "column C" or "line L, column C" for messages.</param>
    public RecursiveDescentParser(string text, string variable, Func<int, string> describePosition)
    {
        this.text = text;
        this.variable = variable;
        this.describePosition = describePosition;
        tokens = ExpressionLexer.Tokenize(text);
    }

    /// <summary>Every use of a parameter name, in text order (valid after <see cref="ParseWhole"/>).</summary>
    public ImmutableArray<NameUse> Uses => [.. uses];

    /// <summary>Distinct parameter names in order of first use (valid after <see cref="ParseWhole"/>).</summary>
    public ImmutableArray<string> DistinctNames => [.. distinctNames];

    private Token Current => tokens[position];

    private Token Previous => tokens[position - 1];

    /// <summary>Parses the whole text as one expression.</summary>
    /// <exception cref="ExpressionSyntaxException">Any syntax error, located.</exception>
    public ExpressionNode ParseWhole()
    {
        if (Current.Kind == TokenKind.End)
        {
            throw new ExpressionSyntaxException(0, $"empty expression: expected {ParserMessages.OperandWords(variable)}");
        }

        var node = ParseSum();
        if (Current.Kind == TokenKind.CloseParen)
        {
            throw new ExpressionSyntaxException(Current.Offset, "unmatched ')': there is no '(' to close");
        }

        if (Current.Kind != TokenKind.End)
        {
            throw new ExpressionSyntaxException(Current.Offset, $"unexpected {ParserMessages.Describe(Current)} after a complete expression");
        }

        return node;
    }

    private ExpressionNode ParseSum()
    {
        var first = ParseProduct();
        if (Current.Kind is not (TokenKind.Plus or TokenKind.Minus))
        {
            return first;
        }

        var terms = ImmutableArray.CreateBuilder<SumTerm>();
        terms.Add(new SumTerm(first, false));
        bool hasVariable = first.ContainsVariable;
        var bound = first.Degree;
        while (Current.Kind is TokenKind.Plus or TokenKind.Minus)
        {
            var op = Current;
            position++;
            var term = ParseProduct();
            terms.Add(new SumTerm(term, op.Kind == TokenKind.Minus));
            hasVariable |= term.ContainsVariable;
            bound = DegreeBound.Sum(bound, term.Degree);
            CheckDegree(bound, op.Offset);
        }

        return new SumNode(first.Start, Previous.End, terms.ToImmutable(), hasVariable, bound);
    }

    private ExpressionNode ParseProduct()
    {
        int start = Current.Offset;
        var first = ParseUnary();
        ImmutableArray<ProductFactor>.Builder? factors = null;
        bool hasVariable = first.ContainsVariable;
        var bound = first.Degree;
        while (true)
        {
            if (StartsOperand(Current))
            {
                throw ParserMessages.MissingStar(text, start, Previous.End, Current);
            }

            if (Current.Kind is not (TokenKind.Star or TokenKind.Slash))
            {
                break;
            }

            var op = Current;
            position++;
            start = Current.Offset;
            var factor = ParseUnary();
            bool divide = op.Kind == TokenKind.Slash;
            factors ??= ImmutableArray.CreateBuilder<ProductFactor>();
            if (factors.Count == 0)
            {
                factors.Add(new ProductFactor(first, false));
            }

            factors.Add(new ProductFactor(factor, divide));
            hasVariable |= factor.ContainsVariable;
            bound = divide ? DegreeBound.Quotient(bound, factor.Degree) : DegreeBound.Product(bound, factor.Degree);
            CheckDegree(bound, op.Offset);
        }

        return factors is null
            ? first
            : new ProductNode(first.Start, Previous.End, factors.ToImmutable(), hasVariable, bound);
    }

    private ExpressionNode ParseUnary()
    {
        if (++depth > ExpressionLimits.MaxNestingDepth)
        {
            throw new ExpressionSyntaxException(
                Current.Offset,
                $"expression nested too deeply (more than {ExpressionLimits.MaxNestingDepth} levels of parentheses, signs or powers)");
        }

        // The depth limit alone is not enough: a level through a function call costs seven frames, and unoptimised
        // (tier-0) frames on a 1 MB thread ran out of stack before 200 levels. So the stack left is asked too.
        if (!RuntimeHelpers.TryEnsureSufficientExecutionStack())
        {
            throw new ExpressionSyntaxException(
                Current.Offset,
                $"expression nested too deeply for this thread's stack ({depth} levels of parentheses, signs, powers or functions)");
        }

        ExpressionNode node;
        if (Current.Kind == TokenKind.Minus)
        {
            int start = Current.Offset;
            position++;
            var operand = ParseUnary();
            node = new NegateNode(start, operand.End, operand);
        }
        else
        {
            node = ParsePower();
        }

        depth--;
        return node;
    }

    private ExpressionNode ParsePower()
    {
        var baseNode = ParsePrimary();
        if (Current.Kind != TokenKind.Caret)
        {
            return baseNode;
        }

        position++;
        var exponent = ParseUnary();
        return PowerRules.Build(text, baseNode, exponent, variable);
    }

    private ExpressionNode ParsePrimary()
    {
        var token = Current;
        switch (token.Kind)
        {
            case TokenKind.Number:
                position++;
                return new NumberNode(token.Offset, token.End, token.Value, true);
            case TokenKind.Name:
                position++;
                return ParseName(token);
            case TokenKind.OpenParen:
                position++;
                var inner = ParseSum();
                ExpectClose(token);
                return inner with { Start = token.Offset, End = Previous.End };
            default:
                throw ParserMessages.ExpectedOperand(token, position > 0 ? Previous : null, variable);
        }
    }

    private ExpressionNode ParseName(Token token)
    {
        string name = token.Text;
        if (name == variable)
        {
            return new VariableNode(token.Offset, token.End);
        }

        if (name == "pi")
        {
            return new NumberNode(token.Offset, token.End, Math.PI, false);
        }

        if (ExpressionNames.FunctionOf(name) is { } function)
        {
            return ParseCall(token, function);
        }

        if (ExpressionNames.IsVariable(name))
        {
            throw new ExpressionSyntaxException(
                token.Offset, $"'{name}' cannot be used here: the variable of this expression is {variable}");
        }

        if (!nameIndex.TryGetValue(name, out int index))
        {
            index = distinctNames.Count;
            nameIndex.Add(name, index);
            distinctNames.Add(name);
        }

        uses.Add(new NameUse(name, token.Offset));
        return new NameNode(token.Offset, token.End, name, index);
    }

    private FunctionNode ParseCall(Token nameToken, ScalarFunction function)
    {
        string name = nameToken.Text;
        if (Current.Kind != TokenKind.OpenParen)
        {
            throw new ExpressionSyntaxException(nameToken.Offset, $"'{name}' is a function: write {name}(...)");
        }

        var open = Current;
        position++;
        var argument = ParseSum();
        ExpectClose(open);
        if (argument.ContainsVariable)
        {
            throw new ExpressionSyntaxException(
                argument.Start, $"{name} needs an argument free of {variable} ({variable} may only appear in + - * / and whole powers)");
        }

        return new FunctionNode(nameToken.Offset, Previous.End, function, argument);
    }

    private void ExpectClose(Token open)
    {
        if (Current.Kind == TokenKind.CloseParen)
        {
            position++;
            return;
        }

        string found = Current.Kind == TokenKind.End ? "the end of the expression" : ParserMessages.Describe(Current);
        throw new ExpressionSyntaxException(
            Current.Offset, $"expected ')' to close the '(' at {describePosition(open.Offset)}, found {found}");
    }

    private static bool StartsOperand(Token token) => token.Kind is TokenKind.Number or TokenKind.Name or TokenKind.OpenParen;

    private static void CheckDegree(DegreeBound bound, int offset)
    {
        if (bound.Max > ExpressionLimits.MaxDegree)
        {
            throw new ExpressionSyntaxException(offset, ParserMessages.DegreeTooHigh(bound.Max));
        }
    }
}
