using System.Collections.Immutable;
using System.Globalization;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Robust design of the swept parameter: the intervals of its span where every pole limit of the specs holds, every
/// pole is strictly stable and the step response's overshoot stays within <c>max_overshoot_pct</c>, at every point of
/// the tolerance band checked; and a recommended value inside the widest interval.
/// <para>Points checked: the intervals are judged at the nominal point and every corner of the tolerance box, not
/// inside it. A figure can be worst inside the box (a damping ratio that dips mid-band); that is searched for only at
/// the recommended value, by <see cref="LoopCheck.Run"/>, whose result comes with the recommendation. Overshoot is
/// judged at the same points as the check judges it (<see cref="OvershootCheck"/>: nominal and corners).</para>
/// <para>Pole limits: the feasibility of a swept value p is the smallest relative margin over those points and limits
/// (negative when some pole is not strictly stable). Its sign changes are bracketed on a uniform grid of
/// <see cref="GridPoints"/> values plus every point's own spec boundaries and stability crossings (the exact values
/// the locus engine solves, see <see cref="SpecBoundaries"/>, <see cref="LocusFacts"/>), and the midpoints next to
/// them; then each end is bisected to <see cref="SignIntervals.DefaultRelTol"/> of its own value (far better than
/// 1e-9 relative; an end at 0 to 1e-15 of the span's scale). Between consecutive hints the feasibility cannot change
/// sign, so intervals narrower than a grid step are found too, as long as the locus engine finds each point's
/// boundaries.</para>
/// <para>Overshoot (when the specs set <c>max_overshoot_pct</c> and the loop has a step response, in either plane: s,
/// delayed, or sampled in z): a step response is simulated at each point with <see cref="LoopResponse.Analyse"/>, the
/// figure <c>check</c> reports, so a value inside an interval passes the check's overshoot test at those points. It
/// is simulated only inside the pole-feasible intervals, where every point is stable: each is sampled at 17 values,
/// dips between samples are followed by parabolas, and each crossing of the limit is solved by bracketed regula falsi
/// to 1e-9 of the end's own value (an end at 0 to 1e-12 of the span's scale). That is where the simulated figure
/// crosses the limit. The simulated response is exact at its grid instants (a sampled loop's: the plant output between
/// samples, 10 to 200 points a sample), and between them the peak is a parabola through three points; on K/(s(s + a))
/// the figure matches the handbook overshoot to about 3e-7 of its value at 10 % and 8e-6 at 50 %, which puts a
/// continuous loop's end 2e-7 and 2e-5 (relative) from the exact one; on K/(s(s + 1)) sampled every second behind a
/// hold, 10 points a sample, the 20 % end is 1.1e-5 from the exact one. An excursion beyond the limit narrower than a
/// sample step that no sample or parabola reveals is missed: overshoot has no boundary equations to give hints.</para>
/// <para>The recommended value maximises the smallest relative margin, (limit − figure)/|limit| for a maximum and
/// (figure − limit)/|limit| for a minimum (the slowest decay rate, 1/s, when the file sets no limit at all), over the
/// same points inside the widest interval. Overshoot's relative margin is (limit − overshoot)/limit, the unused share
/// of the allowed overshoot (1 with no overshoot), so it weighs against the pole margins like any other maximum; with
/// no pole limit it is the whole objective. Without overshoot the interval is sampled at <see cref="RecommendSamples"/>
/// values, then refined by golden-section search around the best sample to 1e-10 of the span's scale. The margin is
/// a minimum of smooth pieces, so its maximum is often a kink where two limits are equally tight; golden-section
/// search needs no derivative. With overshoot, the pole margins' best value is found that way first; the smallest
/// margin can nowhere exceed the pole margins, so when the overshoot margin there is no smaller, that value stands
/// (one more simulation per point). Otherwise, or when the pole margins' best is a plateau, the search is over both
/// margins: the samples are the values the overshoot search simulated (at least
/// <see cref="MinRecommendSamples"/>), valued best bound first so that values the pole margins already rule out are
/// not simulated; the golden-section search stops at <see cref="OvershootStopShare"/>; and when the best value is
/// held over a stretch (no overshoot at all, say), the ends of that plateau are solved by bisection and its middle
/// taken. The recommendation's full <see cref="LoopCheck"/> judges the same overshoot, so it passes it.</para>
/// </summary>
public static class RobustDesign
{
    /// <summary>Uniform grid values over the span that bracket changes the hints do not give.</summary>
    public const int GridPoints = 401;

    /// <summary>Samples of the widest interval before the recommended value is refined.</summary>
    public const int RecommendSamples = 41;

    /// <summary>
    /// Spec boundaries and stability crossings are solved per point (a locus trace each) only up to this many corners;
    /// a bigger box relies on the nominal point's hints and the grid.
    /// </summary>
    public const int MaxHintedCorners = 64;

    /// <summary>
    /// With an overshoot limit, the golden-section search for the recommended value stops at this share of the span's
    /// scale rather than at 1e-10: every step simulates responses, and a value printed to six digits needs no more.
    /// </summary>
    public const double OvershootStopShare = 1e-8;

    /// <summary>Fewest samples of the widest interval the recommended value is sought from, with an overshoot limit.</summary>
    public const int MinRecommendSamples = 9;

    /// <summary>
    /// Significant digits the recommended value is rounded to before the full band check (more when the interval is
    /// so narrow that six would leave it), so the value reported, checked, shown and saved is one and the same number.
    /// </summary>
    public const int RecommendedDigits = 6;

    /// <summary>Intervals no wider than this share of the span's scale are rounding touches of a boundary and dropped.</summary>
    public const double MinWidthShare = 1e-10;

    /// <summary>
    /// Designs <paramref name="model"/>'s swept parameter over <paramref name="span"/>, the other parameters at
    /// <paramref name="values"/> (missing names take their nominal value; the swept parameter's own value is not used).
    /// </summary>
    /// <exception cref="ArgumentException">The span is empty or not finite, or a value names no parameter or is not finite.</exception>
    /// <exception cref="PlantFileException">The loop cannot be formed at some point of the band (away from the swept
    /// parameter), or at the recommended value.</exception>
    public static DesignResult Find(LoopModel model, IReadOnlyDictionary<string, double> values, Interval span)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(values);
        if (!(span.Low < span.High) || !double.IsFinite(span.Low) || !double.IsFinite(span.High))
        {
            throw new ArgumentException($"The span must be finite with low < high (got {span.Low}, {span.High}).", nameof(span));
        }

        var plant = model.Plant;
        string sweep = plant.Loop.Sweep;
        var full = plant.NominalValues().SetItems(values);
        var box = ToleranceBox.FromPlant(plant, sweep, full);
        var points = DesignPoints.Create(model, full, box);
        var criteria = new DesignCriteria(points, DesignOvershoot.Create(model, full, box));
        double scale = Scale(span);
        var found = SignIntervals.Find(p => points.At(p).Feasibility, span.Low, span.High, GridPoints,
            Candidates(points, model, span)).Where(i => i.To - i.From > MinWidthShare * scale).ToList();
        var sampled = new List<double>();
        if (criteria.Overshoot is { } overshoot)
        {
            found = found.SelectMany(i => OvershootIntervals.Within(overshoot, i.From, i.To, scale, sampled))
                .Where(i => i.To - i.From > MinWidthShare * scale).ToList();
        }

        var intervals = found.Select(i => DesignLimits.Describe(criteria, span, i.From, i.To)).ToImmutableArray();
        DesignRecommendation? recommended = null;
        if (intervals.MaxBy(i => i.Width) is { } widest)
        {
            double best = criteria.Overshoot is null
                ? DesignOptimum.Maximize(p => criteria.Objective(p, double.NegativeInfinity), widest.From, widest.To, RecommendSamples, scale)
                : RecommendWithOvershoot(criteria, criteria.Overshoot, widest, sampled, scale);
            best = RoundInside(best, widest.From, widest.To);
            var check = LoopCheck.Run(model, full.SetItem(sweep, best));
            recommended = new DesignRecommendation(best, SmallestMargin(check, criteria), check);
        }

        return new DesignResult(sweep, span, box, points.Points.Length, intervals, recommended)
        {
            OvershootJudged = criteria.Overshoot is not null,
        };
    }

    // The fewest digits from RecommendedDigits up that keep the value inside [from, to]; 17 digits are the value itself.
    private static double RoundInside(double value, double from, double to)
    {
        for (int digits = RecommendedDigits; digits < 17; digits++)
        {
            double rounded = double.Parse(
                value.ToString("G" + digits.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
            if (from <= rounded && rounded <= to)
            {
                return rounded;
            }
        }

        return value;
    }

    /// <summary>The scale relative tolerances refer to: max(span width, |low|, |high|).</summary>
    internal static double Scale(Interval span) => Math.Max(span.Width, Math.Max(Math.Abs(span.Low), Math.Abs(span.High)));

    // The pole margins' best value first, found as without overshoot (root finds only): the smallest margin cannot
    // exceed the pole margins anywhere, so when the overshoot margin there is no smaller, that value is the best of
    // both. Otherwise (or on a plateau, whose middle depends on both) the search over both margins.
    private static double RecommendWithOvershoot(
        DesignCriteria criteria, DesignOvershoot overshoot, FeasibleInterval widest, List<double> sampled, double scale)
    {
        if (criteria.Points.Limits.Count > 0)
        {
            var (poles, value) = DesignOptimum.MaximizeOrPlateau(
                p => criteria.Objective(p, double.NegativeInfinity, withOvershoot: false), widest.From, widest.To, RecommendSamples, scale);
            if (value is double best && overshoot.MarginAt(poles, best) >= best)
            {
                return poles;
            }
        }

        return DesignOptimum.Maximize(
            criteria.Bound, (p, floor) => criteria.Objective(p, floor), RecommendationSamples(sampled, widest), scale, OvershootStopShare);
    }

    // The values the overshoot search sampled inside the interval (their responses are simulated already) and its ends;
    // evenly spread values besides when that leaves too few.
    private static List<double> RecommendationSamples(List<double> sampled, FeasibleInterval interval)
    {
        var xs = sampled.Where(x => x > interval.From && x < interval.To).Append(interval.From).Append(interval.To).ToHashSet();
        if (xs.Count < MinRecommendSamples)
        {
            xs.UnionWith(Enumerable.Range(1, MinRecommendSamples - 2)
                .Select(i => interval.From + (interval.Width * i / (MinRecommendSamples - 1))));
        }

        return [.. xs.Order()];
    }

    // Every point's hints, and the midpoints beside each hint (between it and its neighbours among the hints and the
    // grid): feasibility is constant between consecutive exact hints, so a midpoint decides each gap.
    private static List<double> Candidates(DesignPoints points, LoopModel model, Interval span)
    {
        int hinted = points.Points.Length - 1 <= MaxHintedCorners ? points.Points.Length : 1;
        var hints = points.Points.Take(hinted)
            .SelectMany(point => DesignHints.For(point.Family, model.Plane, span, model.Plant.Specs))
            .ToHashSet();
        var all = Enumerable.Range(0, GridPoints)
            .Select(i => span.Low + (span.Width * i / (GridPoints - 1)))
            .Concat(hints).Order().Distinct().ToArray();
        var result = new List<double>(hints);
        for (int i = 0; i + 1 < all.Length; i++)
        {
            if (hints.Contains(all[i]) || hints.Contains(all[i + 1]))
            {
                result.Add(all[i] + ((all[i + 1] - all[i]) / 2.0));
            }
        }

        return result;
    }

    // Over the limits the design judged, which are the check's limits: the check judges overshoot exactly when a step
    // response exists, as the design does.
    private static DesignMargin SmallestMargin(LoopCheckResult check, DesignCriteria criteria)
    {
        var judged = criteria.Keys.ToHashSet(StringComparer.Ordinal);
        var tightest = check.Band.Where(b => judged.Contains(b.Key)).MinBy(b => b.WorstRelativeMargin);
        if (check.StableAcrossBand && tightest is not null)
        {
            return new DesignMargin(tightest.Key, tightest.WorstMargin, tightest.WorstRelativeMargin, tightest.At, tightest.AtCorner);
        }

        var slowest = check.WorstDecayRate;
        double sigma = slowest?.Value ?? double.PositiveInfinity;
        return new DesignMargin(DesignMargin.StabilityKey, sigma, sigma,
            slowest?.At.Toleranced ?? ImmutableDictionary<string, double>.Empty, slowest?.At.IsCorner ?? true);
    }
}
