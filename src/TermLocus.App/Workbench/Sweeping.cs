using System.Collections.Immutable;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

/// <summary>Commands that move the swept value. Only the poles at the new value are recomputed; the trace stays.</summary>
internal static class Sweeping
{
    // Marks closer than this fraction of the range to the current value count as "here", not "next".
    private const double MarkTolerance = 1e-9;

    public static (WorkbenchState, ImmutableArray<Effect>) Step(WorkbenchState s, int direction)
    {
        if (s.Session is not { } session)
        {
            return Update.NoPlant(s);
        }

        var sweep = session.Sweep;
        double target = StepSeries.Next(sweep.Value, sweep.Step, direction);
        bool wasInside = sweep.Range.Contains(sweep.Value);
        if (wasInside)
        {
            target = Math.Clamp(target, sweep.Range.Low, sweep.Range.High);
        }

        if (target == sweep.Value)
        {
            string end = direction < 0 ? "start" : "end";
            return Update.Say(s, StatusMessage.Warning(
                $"at the {end} of the range of {sweep.Name} ({NumberText.Exact(target)})"));
        }

        return SetValue(s, target, null);
    }

    public static (WorkbenchState, ImmutableArray<Effect>) ChangeStep(WorkbenchState s, bool finer)
    {
        if (s.Session is not { } session)
        {
            return Update.NoPlant(s);
        }

        var sweep = session.Sweep;
        double step = finer ? StepSeries.Finer(sweep.Step, sweep.Range.Width) : StepSeries.Coarser(sweep.Step, sweep.Range.Width);
        if (step == sweep.Step)
        {
            return Update.Say(s, StatusMessage.Warning(finer ? "this is the finest step" : "this is the coarsest step"));
        }

        return Update.Done(s with { Session = session with { Sweep = sweep with { Step = step } } });
    }

    public static (WorkbenchState, ImmutableArray<Effect>) ToRangeEnd(WorkbenchState s, bool atStart)
    {
        if (s.Session is not { } session)
        {
            return Update.NoPlant(s);
        }

        var range = session.Sweep.Range;
        return SetValue(s, atStart ? range.Low : range.High, null);
    }

    public static (WorkbenchState, ImmutableArray<Effect>) ToMark(WorkbenchState s, int direction)
    {
        if (s.Session is not { } session)
        {
            return Update.NoPlant(s);
        }

        if (session.Locus is not { } locus || !session.LocusIsCurrent)
        {
            return Update.Say(s, StatusMessage.Warning("the locus is still being traced"));
        }

        var sweep = session.Sweep;
        double value = sweep.Value;
        double tolerance = MarkTolerance * Math.Max(sweep.Range.Width, Math.Abs(value));
        // A stop counts as "here" when the value is the stop itself or the tidy number standing for it.
        bool Beyond(Stop m) => Math.Abs(m.Value - value) > tolerance && NumberText.Tidy(m.Value, sweep.Step) != value;
        var stops = locus.Marks.Select(m => new Stop(m.Value, at => $"{SpecWording.DescribeMark(m)} {at}"))
            .Concat(BandLimits(session)).Where(Beyond);
        Stop? stop = direction > 0
            ? stops.Where(m => m.Value > value).MinBy(m => m.Value)
            : stops.Where(m => m.Value < value).MaxBy(m => m.Value);
        if (stop is null)
        {
            string where = direction > 0 ? "above" : "below";
            return Update.Say(s, StatusMessage.Info(
                $"no spec boundary, crossing or band limit {where} {sweep.Name} = {NumberText.Exact(value)} in the range"));
        }

        double target = NumberText.Tidy(stop.Value, sweep.Step);
        return SetValue(s, target, StatusMessage.Info(stop.Describe($"at {sweep.Name} = {NumberText.Exact(target)}")));
    }

    // The ends of the design's feasible intervals inside the range (once the design is worked out): where some point
    // of the tolerance band starts to miss a spec. An end at the range's own end, limited by no spec, is not one.
    private static IEnumerable<Stop> BandLimits(PlantSession session)
    {
        if (session.Design?.Result is not { } design)
        {
            return [];
        }

        static string Keys(ImmutableArray<string> keys) => SafeText.Visible(string.Join(" and ", keys));
        var range = session.Sweep.Range;
        return design.Intervals.SelectMany(i => new[]
            {
                i.FromLimitedBy.IsEmpty ? null
                    : new Stop(i.From, at => $"band limit {at}; below it the band misses {Keys(i.FromLimitedBy)}"),
                i.ToLimitedBy.IsEmpty ? null
                    : new Stop(i.To, at => $"band limit {at}; above it the band misses {Keys(i.ToLimitedBy)}"),
            })
            .OfType<Stop>()
            .Where(m => range.Contains(m.Value));
    }

    // A value p/n stop at, and its words around "at Kp = 12.5".
    private sealed record Stop(double Value, Func<string, string> Describe);

    public static (WorkbenchState, ImmutableArray<Effect>) ToRecommended(WorkbenchState s)
    {
        if (s.Session is not { } session)
        {
            return Update.NoPlant(s);
        }

        var sweep = session.Sweep;
        switch (session.Design)
        {
            case null when session.Loaded.Model is null:
                return Update.Say(s, StatusMessage.Warning("no design for a plant without a loop model"));
            case null:
                return Update.Say(s, StatusMessage.Info("the feasible intervals are still being worked out; try again in a moment"));
            case { Result: null, Problem: var problem }:
                return Update.Say(s, StatusMessage.Error("no design: " + SafeText.Visible(problem ?? "unknown")));
            case { Result.Recommended: null } design:
                return Update.Say(s, StatusMessage.Warning(
                    $"no {sweep.Name} in {NumberText.Short(design.Result.Span.Low, 6)}..{NumberText.Short(design.Result.Span.High, 6)} " +
                    "meets every spec at nominal and at every band corner"));
        }

        var result = session.Design.Result!;
        double best = result.Recommended!.Value;
        // The design rounds its recommendation to the digits it reports; the same number is shown, checked and saved.
        double value = best;
        var interval = result.Intervals.FirstOrDefault(i => i.From <= best && best <= i.To) ?? result.Widest!;
        bool lowNearer = best - interval.From <= interval.To - best;
        double end = lowNearer ? interval.From : interval.To;
        var keys = lowNearer ? interval.FromLimitedBy : interval.ToLimitedBy;
        string limit = keys.IsEmpty ? "end of the range" : string.Join(" and ", keys.Select(SafeText.Visible));
        return SetValue(s, value, StatusMessage.Info(
            $"recommended {sweep.Name} = {NumberText.Exact(value)} in {NumberText.Short(interval.From, 4)}..{NumberText.Short(interval.To, 4)}; " +
            $"nearest end {NumberText.Short(end, 4)}: {limit}"));
    }

    public static (WorkbenchState, ImmutableArray<Effect>) Revert(WorkbenchState s)
    {
        if (s.Session is not { } session)
        {
            return Update.NoPlant(s);
        }

        var sweep = session.Sweep;
        string back = $"back to the saved value {sweep.Name} = {NumberText.Exact(sweep.SavedValue)}";
        if (session.AppliedRecovery is { } recovery)
        {
            // Going back is no decision about the recovered value: the file stays until a save or a discard.
            back += $"; {SafeText.Visible(Path.GetFileName(recovery))} kept for next time";
        }

        return SetValue(s, sweep.SavedValue, StatusMessage.Info(back));
    }

    public static (WorkbenchState, ImmutableArray<Effect>) Pick(WorkbenchState s, double value)
    {
        if (s.Session is not { } session || !double.IsFinite(value))
        {
            return Update.Done(s);
        }

        double rounded = StepSeries.Round(value, session.Sweep.Step / 10);
        return SetValue(s, rounded, StatusMessage.Info($"picked {session.Sweep.Name} = {NumberText.Exact(rounded)} on the plane"));
    }

    /// <summary>Sets the swept value and recomputes the poles and the band there (not the trace).</summary>
    public static (WorkbenchState, ImmutableArray<Effect>) SetValue(WorkbenchState s, double value, StatusMessage? message)
    {
        var session = s.Session!;
        var sweep = session.Sweep with { Value = value };
        var (updated, effects) = Recompute.Session(session with { Sweep = sweep }, s.ShowsResponse);
        if (message is null && !sweep.Range.Contains(value))
        {
            message = StatusMessage.Warning(
                $"{sweep.Name} = {NumberText.Exact(value)} is outside the traced range " +
                $"[{NumberText.Exact(sweep.Range.Low)}, {NumberText.Exact(sweep.Range.High)}]");
        }

        return (s with { Session = updated, Message = message ?? s.Message }, effects);
    }
}
