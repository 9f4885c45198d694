namespace TermLocus.App.Workbench;

/// <summary>A one-line message shown in the status line until the next command.</summary>
/// <param name="Text">Plain words; any file text inside has already been made safe.</param>
/// <param name="Kind">How much it matters.</param>
public sealed record StatusMessage(string Text, MessageKind Kind)
{
    /// <summary>An informational message.</summary>
    public static StatusMessage Info(string text) => new(text, MessageKind.Info);

    /// <summary>A warning.</summary>
    public static StatusMessage Warning(string text) => new(text, MessageKind.Warning);

    /// <summary>An error.</summary>
    public static StatusMessage Error(string text) => new(text, MessageKind.Error);
}
