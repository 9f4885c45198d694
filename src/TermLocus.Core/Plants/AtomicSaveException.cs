namespace TermLocus.Core.Plants;

/// <summary>Thrown by <see cref="AtomicFileSaver.Save"/> when a save was refused or failed; the file is untouched.</summary>
public sealed class AtomicSaveException : IOException
{
    /// <summary>Creates the exception from the failed result.</summary>
    public AtomicSaveException(AtomicSaveResult result)
        : base(result?.Message) => Result = result!;

    /// <summary>What happened.</summary>
    public AtomicSaveResult Result { get; }
}
