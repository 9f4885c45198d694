namespace TermLocus.Core.Tests.Fuzz;

/// <summary>A fuzz case broke a rule of the pipeline; the message names the input.</summary>
internal sealed class FuzzCaseException : Exception
{
    public FuzzCaseException(string message, Exception inner)
        : base(message, inner)
    {
    }

    public FuzzCaseException(string message)
        : base(message)
    {
    }

    public FuzzCaseException()
    {
    }
}
