namespace TermLocus.Cli;

/// <summary>Every headless verb, in the order --help lists them.</summary>
internal static class VerbCatalog
{
    /// <summary>A fresh instance of each verb.</summary>
    public static IReadOnlyList<IVerb> All() =>
    [
        new Verbs.CheckVerb(),
        new Verbs.AnalyzeVerb(),
        new Verbs.DesignVerb(),
        new Verbs.TraceVerb(),
        new Verbs.PlotVerb(),
        new Verbs.ResponseVerb(),
        new Verbs.SaveVerb(),
    ];
}
