using System.Collections.Immutable;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

#pragma warning disable CS8524 // every named value is handled; see Update.

/// <summary>
/// The status lines: the verdict ("all specs met", or the worst violation in words and numbers: which spec, limit,
/// actual, which pole), the latest message, and key hints generated from the key table.
/// </summary>
public static class StatusLinePresenter
{
    /// <summary>
    /// Exactly <paramref name="height"/> lines (1 to 3) of <paramref name="width"/> columns: the verdict, then the
    /// message (or the hints when there is no room for both), then the hints.
    /// </summary>
    public static ImmutableArray<string> Lines(WorkbenchState state, int width, int height, Glyphs glyphs)
    {
        string verdict = Verdict(state.Session, glyphs);
        string hints = KeyHints.Line(state, width, glyphs);
        string? message = state.Message is { } m ? MessageText(m) : null;
        string[] lines = height switch
        {
            <= 1 => [message ?? verdict],
            2 => [verdict, message ?? hints],
            _ => [verdict, message ?? string.Empty, hints],
        };
        return lines.Select(l => SafeText.Fit(l, width, glyphs.Ellipsis)).Select(l => TextWidth.PadRight(l, width)).ToImmutableArray();
    }

    /// <summary>The verdict line for the open plant.</summary>
    public static string Verdict(PlantSession? session, Glyphs g)
    {
        if (session is null)
        {
            return "no plant open";
        }

        var poles = session.Poles;
        var sweep = session.Sweep;
        if (poles.Problem is { } problem)
        {
            return $"{g.Violated} at {sweep.Name} = {NumberText.Short(sweep.Value)} {SafeText.Visible(problem)}";
        }

        if (!poles.AllMet)
        {
            int more = poles.Misses.Length - 1;
            string tail = more > 0 ? $"  (+{more} more)" : string.Empty;
            return $"{g.Violated} {SpecWording.Violation(poles.Misses[0], g)}{tail}";
        }

        var unstable = poles.Poles.Where(p => p.Real > 0).OrderByDescending(p => p.Real).ToList();
        if (unstable.Count > 0)
        {
            return $"{g.Violated} unstable: a pole at {SpecWording.Location(unstable[0], g)} is in the right half-plane";
        }

        string at = $"at {sweep.Name} = {NumberText.Short(sweep.Value)}";
        return HasSpecs(session) ? $"{g.Met} all specs met {at}" : $"{g.Met} stable {at}; the file sets no specs";
    }

    private static bool HasSpecs(PlantSession session) => session.Loaded.Plant.Specs != Core.Plants.Specs.None;

    private static string MessageText(StatusMessage message) => message.Kind switch
    {
        MessageKind.Error => "error: " + message.Text,
        MessageKind.Warning => message.Text,
        MessageKind.Info => message.Text,
    };
}
