using System.Collections.Immutable;

namespace TermLocus.App.Workbench;

/// <summary>Commands that move the s-plane view.</summary>
internal static class Viewing
{
    public static (WorkbenchState, ImmutableArray<Effect>) Zoom(WorkbenchState s, int direction)
    {
        int steps = s.View.ZoomSteps + direction;
        if (Math.Abs(steps) > ViewState.MaxZoomSteps)
        {
            return Update.Say(s, StatusMessage.Warning(direction > 0 ? "zoomed in as far as it goes" : "zoomed out as far as it goes"));
        }

        return Update.Done(s with { View = s.View with { ZoomSteps = steps } });
    }

    public static (WorkbenchState, ImmutableArray<Effect>) Pan(WorkbenchState s, int right, int up)
    {
        // A pan step is a quarter of what is on screen, so it feels the same at every zoom.
        double step = ViewState.PanStepFraction / s.View.ZoomFactor;
        return Update.Done(s with
        {
            View = s.View with { PanRight = s.View.PanRight + (right * step), PanUp = s.View.PanUp + (up * step) },
        });
    }

    public static (WorkbenchState, ImmutableArray<Effect>) ToggleResponse(WorkbenchState s)
    {
        var shown = s with { ShowsResponse = !s.ShowsResponse };
        if (!shown.ShowsResponse || shown.Session is not { } session)
        {
            return Update.Done(shown);
        }

        var (updated, effects) = Recompute.Session(session, withResponse: true);
        return (shown with { Session = updated }, effects);
    }
}
