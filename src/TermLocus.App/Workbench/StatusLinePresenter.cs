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

    /// <summary>
    /// The verdict line for the open plant: a miss of the poles shown (at the swept value and the varied parameter's
    /// place), else a miss anywhere in the band box with the point where it happens, else all met.
    /// </summary>
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
            return $"{g.Violated} at {sweep.Name} = {NumberText.Exact(sweep.Value)} {SafeText.Visible(problem)}";
        }

        string here = session.Varied.IsNominal ? string.Empty : $" (with {VariedWords(session.Varied)})";
        if (!poles.AllMet)
        {
            int more = poles.Misses.Length - 1;
            string tail = more > 0 ? $"  (+{more} more)" : string.Empty;
            return $"{g.Violated} {SpecWording.Violation(poles.Misses[0], g)}{here}{tail}";
        }

        if (!poles.Unstable.IsEmpty)
        {
            var pole = poles.Unstable[0];
            string place = SpecWording.Location(pole, g);
            if (PoleRows.OnBoundary(pole, poles.Plane))
            {
                string on = poles.Plane.IsSampled ? "on the unit circle" : "on the imaginary axis";
                return $"{g.Violated} marginal: a pole at {place} is {on}, the stability boundary{here}";
            }

            string where = poles.Plane.IsSampled ? "is outside the unit circle" : "is in the right half-plane";
            return $"{g.Violated} unstable: a pole at {place} {where}{here}";
        }

        if (BandVerdict(session, g) is { } band)
        {
            return band;
        }

        string at = $"at {sweep.Name} = {NumberText.Exact(sweep.Value)}";
        if (session.CheckPending)
        {
            return $"{g.Met} {(HasSpecs(session) ? "all specs met" : "stable")} {at}; checking the band{g.Ellipsis}";
        }

        bool boxed = session.Check?.Result is { Box.Axes.IsEmpty: false };
        return (HasSpecs(session), boxed) switch
        {
            (true, true) => $"{g.Met} all specs met across the band {at}",
            (true, false) => $"{g.Met} all specs met {at}",
            (false, true) => $"{g.Met} stable across the band {at}; the file sets no specs",
            (false, false) => $"{g.Met} stable {at}; the file sets no specs",
        };
    }

    /// <summary>"J 0.48 (+14.3 %)": the varied parameter's value and its offset from nominal.</summary>
    public static string VariedWords(VariedPosition varied)
    {
        string offset = varied.PercentFromNominal is double pct ? $" ({Signed(pct)} %)" : string.Empty;
        return $"{varied.Parameter} {NumberText.Short(varied.Value, 6)}{offset}";
    }

    /// <summary>A percentage with its sign and at most one decimal: "+14.3", "-25", "0".</summary>
    public static string Signed(double pct)
    {
        double rounded = Math.Round(pct, 1);
        string text = rounded.ToString("0.#", System.Globalization.CultureInfo.InvariantCulture);
        return rounded > 0 ? "+" + text : rounded == 0 ? "0" : text;
    }

    // A miss somewhere in the band box that the poles shown do not have: the worst one and where it happens.
    private static string? BandVerdict(PlantSession session, Glyphs g)
    {
        if (session.Check is not { } band)
        {
            return null;
        }

        if (band.Result is not { } check)
        {
            return band.Problem is { } problem ? $"{g.Violated} band not checked: {SafeText.Visible(problem)}" : null;
        }

        var plane = session.Loaded.Plane;
        if (!check.StableAcrossBand)
        {
            string where = check.WorstDecayRate is { } w ? " at " + Reports.BandWording.Point(check.Box, w.At.Toleranced) : string.Empty;
            return $"{g.Violated} in band: the closed loop is unstable{where}";
        }

        var violated = check.Violated;
        if (violated.IsEmpty)
        {
            return null;
        }

        var worst = violated[0];
        var miss = new SpecMiss(worst.Key, worst.Limit, worst.WorstActual, worst.WorstMargin, plane.FromEquivalentS(worst.WorstPole));
        string more = violated.Length > 1 ? $"  (+{violated.Length - 1} more)" : string.Empty;
        return $"{g.Violated} in band: {SpecWording.Violation(miss, g)} with {Reports.BandWording.Point(check.Box, worst.At)}{more}";
    }

    private static bool HasSpecs(PlantSession session) => session.Loaded.Plant.Specs != Core.Plants.Specs.None;

    private static string MessageText(StatusMessage message) => message.Kind switch
    {
        // A located error (FILE:LINE:COL: error: ...) says "error" itself.
        MessageKind.Error when message.Text.Contains(": error: ", StringComparison.Ordinal) => message.Text,
        MessageKind.Error => "error: " + message.Text,
        MessageKind.Warning => message.Text,
        MessageKind.Info => message.Text,
    };
}
