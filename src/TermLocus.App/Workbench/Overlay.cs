namespace TermLocus.App.Workbench;

/// <summary>What is drawn over the main screen and takes the keys; <see cref="None"/> when nothing is.</summary>
public abstract record Overlay
{
    /// <summary>No overlay: the main screen has the keys.</summary>
    public static Overlay None { get; } = new NoOverlay();
}
