using System.Collections.Immutable;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

/// <summary>
/// Commands that move the varied (toleranced) parameter through its band: a step (a tenth of the band at first, finer
/// or coarser on request), back to nominal, or on to the next toleranced parameter. The swept value stays; the poles, the band figures and the locus
/// follow.
/// </summary>
internal static class Banding
{
    public static (WorkbenchState, ImmutableArray<Effect>) Step(WorkbenchState s, int direction) =>
        WithBand(s, (_, varied) => StepWithin(s, varied, direction));

    public static (WorkbenchState, ImmutableArray<Effect>) ToNominal(WorkbenchState s) =>
        WithBand(s, (_, varied) => MoveTo(s, varied with { Value = varied.Nominal }, StatusMessage.Info(
            $"{varied.Parameter} back to nominal ({NumberText.Short(varied.Nominal, 6)})")));

    public static (WorkbenchState, ImmutableArray<Effect>) NextParameter(WorkbenchState s)
    {
        if (s.Session is not { } session)
        {
            return Update.NoPlant(s);
        }

        var candidates = VariedPosition.Candidates(session.Loaded.Plant);
        if (candidates.Count == 0)
        {
            return Update.Say(s, StatusMessage.Info(NoBand(session)));
        }

        int at = candidates.ToList().FindIndex(p => p.Name == session.Varied.Parameter);
        var next = candidates[(at + 1) % candidates.Count];
        if (candidates.Count == 1)
        {
            return Update.Say(s, StatusMessage.Info($"{next.Name} is the only toleranced parameter"));
        }

        // The parameter left goes back to nominal: one parameter is varied at a time. The step size chosen stays.
        var varied = VariedPosition.AtNominal(next) with { Divisions = session.Varied.Divisions };
        return MoveTo(s, varied, StatusMessage.Info(
            $"varying {next.Name} over {NumberText.Short(varied.Band.Low, 6)} .. {NumberText.Short(varied.Band.High, 6)}; " +
            $"{session.Varied.Parameter} back to nominal"));
    }

    public static (WorkbenchState, ImmutableArray<Effect>) ChangeStep(WorkbenchState s, bool finer) =>
        WithBand(s, (session, varied) => ChangeDivisions(s, session, varied, finer));

    /// <summary>"1/20 of its band (0.04 1/s)": the band step as a fraction and as a value.</summary>
    public static string StepWords(VariedPosition varied)
    {
        string unit = varied.Unit.Length > 0 ? " " + SafeText.Visible(varied.Unit) : string.Empty;
        return $"1/{varied.Divisions} of its band ({NumberText.Short(varied.Step, 4)}{unit})";
    }

    private static (WorkbenchState, ImmutableArray<Effect>) StepWithin(WorkbenchState s, VariedPosition varied, int direction)
    {
        double next = varied.Next(direction);
        if (next == varied.Value)
        {
            string end = direction < 0 ? "low" : "high";
            return Update.Say(s, StatusMessage.Warning(
                $"{varied.Parameter} is at the {end} end of its band ({NumberText.Short(next, 6)})"));
        }

        return MoveTo(s, varied with { Value = next }, null);
    }

    private static (WorkbenchState, ImmutableArray<Effect>) ChangeDivisions(WorkbenchState s, PlantSession session, VariedPosition varied, bool finer)
    {
        int divisions = varied.NextDivisions(finer);
        if (divisions == varied.Divisions)
        {
            return Update.Say(s, StatusMessage.Warning(
                $"{(finer ? "finest" : "coarsest")} band step already: {StepWords(varied)}"));
        }

        var changed = varied with { Divisions = divisions };
        return Update.Done(s with
        {
            Session = session with { Varied = changed },
            Message = StatusMessage.Info($"{varied.Parameter} now steps {StepWords(changed)}"),
        });
    }

    // The band commands need an open plant and a toleranced parameter being varied; each says what is missing.
    private static (WorkbenchState, ImmutableArray<Effect>) WithBand(
        WorkbenchState s, Func<PlantSession, VariedPosition, (WorkbenchState, ImmutableArray<Effect>)> act)
    {
        if (s.Session is not { } session)
        {
            return Update.NoPlant(s);
        }

        return session.Varied.Parameter is null
            ? Update.Say(s, StatusMessage.Info(NoBand(session)))
            : act(session, session.Varied);
    }

    private static (WorkbenchState, ImmutableArray<Effect>) MoveTo(WorkbenchState s, VariedPosition varied, StatusMessage? message)
    {
        var session = s.Session!;
        if (!CoreBridge.TryLoopAt(session.Loaded, varied, out var loop, out var problem))
        {
            return Update.Say(s, StatusMessage.Error(
                $"the loop cannot be formed at {varied.Parameter} = {NumberText.Short(varied.Value, 6)}: {SafeText.Visible(problem ?? "?")}"));
        }

        var (updated, effects) = Recompute.Session(session with { Varied = varied, CurrentLoop = loop }, s.ShowsResponse);
        return (s with { Session = updated, Message = message ?? s.Message }, effects);
    }

    private static string NoBand(PlantSession session) =>
        $"no toleranced parameter besides {session.Sweep.Name}: give one a band or tolerance_pct to step through it";
}
