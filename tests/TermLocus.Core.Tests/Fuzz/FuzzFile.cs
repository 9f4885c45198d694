namespace TermLocus.Core.Tests.Fuzz;

/// <summary>One generated plant file and how it was made (shown when it breaks a rule).</summary>
internal sealed record FuzzFile(byte[] Bytes, string Recipe)
{
    public override string ToString() => Recipe + " => " + FuzzSession.Shorten(System.Text.Encoding.UTF8.GetString(Bytes));
}
