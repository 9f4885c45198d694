namespace TermLocus.Tests.Tui;

/// <summary>Tests that start a Terminal.Gui application share process-wide state: they run one at a time.</summary>
[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class TerminalGuiCollection
{
    public const string Name = "Terminal.Gui";
}
