using System.Text;
using TermLocus.App.Text;

namespace TermLocus.Cli;

/// <summary>
/// The last guard between a verb and the terminal: every character a terminal would act on (C0 and C1 controls, DEL,
/// bidirectional overrides) is written in its visible spelling (<see cref="SafeText.Visible"/>), line breaks excepted.
/// Presenters already make file text visible; this catches any path that forgets, stdout and stderr alike.
/// </summary>
internal sealed class TerminalSafeWriter : TextWriter
{
    private readonly TextWriter inner;

    private TerminalSafeWriter(TextWriter inner)
        : base(inner.FormatProvider)
    {
        this.inner = inner;
        CoreNewLine = inner.NewLine.ToCharArray();
    }

    /// <inheritdoc/>
    public override Encoding Encoding => inner.Encoding;

    /// <summary>The context with both of its streams guarded (once: a guarded stream is not wrapped again).</summary>
    public static CliContext Guard(CliContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        return context with { Out = Wrap(context.Out), Error = Wrap(context.Error) };
    }

    /// <summary>The text as it may reach a terminal: controls made visible, "\n" and "\r\n" kept.</summary>
    public static string Clean(string? text)
    {
        if (string.IsNullOrEmpty(text) || !text.Any(SafeText.IsControl))
        {
            return text ?? string.Empty;
        }

        var sb = new StringBuilder(text.Length + 8);
        for (int i = 0; i < text.Length; i++)
        {
            char c = text[i];
            bool lineBreak = c == '\n' || (c == '\r' && i + 1 < text.Length && text[i + 1] == '\n');
            if (lineBreak || !SafeText.IsControl(c))
            {
                sb.Append(c);
            }
            else
            {
                sb.Append(SafeText.Visible(c.ToString()));
            }
        }

        return sb.ToString();
    }

    /// <inheritdoc/>
    public override void Write(char value)
    {
        // A lone '\r' could return to the line start and overwrite what was printed; only the platform's newline may use it.
        bool newLineCr = value == '\r' && CoreNewLine.Length == 2;
        inner.Write(value == '\n' || newLineCr || !SafeText.IsControl(value) ? value.ToString() : SafeText.Visible(value.ToString()));
    }

    /// <inheritdoc/>
    public override void Write(string? value) => inner.Write(Clean(value));

    /// <inheritdoc/>
    public override void Write(char[] buffer, int index, int count) => inner.Write(Clean(new string(buffer, index, count)));

    /// <inheritdoc/>
    public override void WriteLine(string? value) => inner.WriteLine(Clean(value));

    /// <inheritdoc/>
    public override void WriteLine() => inner.WriteLine();

    /// <inheritdoc/>
    public override void Flush() => inner.Flush();

    private static TextWriter Wrap(TextWriter writer) => writer as TerminalSafeWriter ?? new TerminalSafeWriter(writer);
}
