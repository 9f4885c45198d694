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

        double value = session.Sweep.Value;
        double tolerance = MarkTolerance * Math.Max(session.Sweep.Range.Width, Math.Abs(value));
        SweepMark? mark = direction > 0
            ? locus.Marks.Where(m => m.Value > value + tolerance).MinBy(m => m.Value)
            : locus.Marks.Where(m => m.Value < value - tolerance).MaxBy(m => m.Value);
        if (mark is null)
        {
            string where = direction > 0 ? "above" : "below";
            return Update.Say(s, StatusMessage.Info(
                $"no spec boundary or crossing {where} {session.Sweep.Name} = {NumberText.Exact(value)} in the range"));
        }

        return SetValue(s, mark.Value, StatusMessage.Info(
            $"{SpecWording.DescribeMark(mark)} at {session.Sweep.Name} = {NumberText.Short(mark.Value)}"));
    }

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
        double value = StepSeries.Round(best, sweep.Step / 10);
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
        return SetValue(s, sweep.SavedValue, StatusMessage.Info(
            $"back to the saved value {sweep.Name} = {NumberText.Exact(sweep.SavedValue)}"));
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
