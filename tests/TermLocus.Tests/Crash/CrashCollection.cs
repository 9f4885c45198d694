namespace TermLocus.Tests.Crash;

/// <summary>The crash tests run one at a time: each keeps a child process busy saving, and the machine may have two cores.</summary>
[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class CrashCollection
{
    public const string Name = "Crash";
}
