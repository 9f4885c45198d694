using System.Collections.Immutable;
using System.Numerics;
using TermLocus.App.Text;
using TermLocus.App.Workbench;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.App.Reports;

/// <summary>The text report of <c>termlocus analyze</c>: the locus construction facts and spec boundaries, one fact per line.</summary>
public static class AnalyzeReportPresenter
{
    /// <summary>The report's lines.</summary>
    public static ImmutableArray<string> Lines(string file, Plant plant, LocusStudy study, Glyphs g)
    {
        var lines = ImmutableArray.CreateBuilder<string>();
        var facts = study.Facts;
        string p = SafeText.Visible(plant.Loop.Sweep);
        string v = study.Plane.VariableName;
        lines.Add(SafeText.Fit($"{SafeText.Visible(file)}  {SafeText.Visible(plant.Title)}", CheckReportPresenter.Width));
        lines.Add($"  sweep: {p} from {Num(study.Span.Low)} to {Num(study.Span.High)}"
            + (study.Plane.IsSampled ? $"   z-plane, sample time {Num(study.Plane.SampleTimeSeconds!.Value)} s" : "   s-plane"));
        lines.Add(facts.IsAffine
            ? $"  affine in {p}: P({v}) = A({v}) + {p}·B({v}); the classic rules apply to the loop {p}·B/A"
            : $"  not affine in {p}: asymptotes, break points and angles do not apply; crossings found numerically");
        if (facts.IsAffine)
        {
            lines.Add($"  open-loop poles: {List(facts.OpenLoopPoles, g)}");
            lines.Add($"  open-loop zeros: {List(facts.OpenLoopZeros, g)}");
            foreach (var set in facts.Asymptotes)
            {
                string angles = string.Join(", ", set.AnglesDegrees.Select(a => Num(a) + "°"));
                lines.Add($"  asymptotes ({p} {(set.Sign == LocusGainSign.Positive ? "> 0" : "< 0")}): centroid {Num(set.Centroid)}, angles {angles}");
            }

            foreach (var b in facts.BreakPoints)
            {
                string kind = b.Kind == BreakPointKind.Breakaway ? "breakaway" : "break-in";
                lines.Add($"  {kind} point at {SpecWording.Location(b.Location, g)}, {p} = {Num(b.Value)}");
            }

            AddAngles(lines, "departure", facts.DepartureAngles, g);
            AddAngles(lines, "arrival", facts.ArrivalAngles, g);
        }

        foreach (var c in facts.AxisCrossings)
        {
            lines.Add($"  imaginary-axis crossing at {g.Imaginary}{Num(c.Omega)} rad/s, {p} = {Num(c.Value)}");
        }

        foreach (var c in study.UnitCircleCrossings)
        {
            lines.Add($"  unit-circle crossing at angle {Num(c.AngleRadians)} rad ({Num(c.EquivalentFrequency)} rad/s), {p} = {Num(c.Value)}");
        }

        lines.Add(facts.StableIntervals.IsEmpty
            ? $"  stable for no {p} in the span"
            : $"  stable for {p} in " + string.Join(" and ", facts.StableIntervals.Select(i => $"[{Num(i.From)}, {Num(i.To)}]")));
        foreach (var s in study.SpecBoundaries)
        {
            string turn = s.PoleMeetsLimitAfter ? "met above" : "missed above";
            string limit = s.Spec switch
            {
                SpecBoundaryKind.MinDamping => $"{g.Zeta} {Num(s.Limit)}",
                SpecBoundaryKind.MinDecayRate => $"{g.DecayRate} {Num(s.Limit)} 1/s",
                _ => $"{g.NaturalFrequency} {Num(s.Limit)} rad/s",
            };
            lines.Add($"  {s.Spec.Key(plant.Specs)} boundary ({limit}) at {p} = {Num(s.Value)}, {turn}, pole {SpecWording.Location(s.Pole, g)}");
        }

        return lines.ToImmutable();
    }


    private static void AddAngles(ImmutableArray<string>.Builder lines, string word, ImmutableArray<AngleConditionDirection> angles, Glyphs g)
    {
        foreach (var a in angles.Where(a => a.At.Imaginary > 0))
        {
            lines.Add($"  {word} angle at {SpecWording.Location(a.At, g).Replace(g.PlusMinus + " ", "+ ", StringComparison.Ordinal)}: {Num(a.AngleDegrees)}°"
                + (a.Sign == LocusGainSign.Negative ? " (negative values)" : string.Empty));
        }
    }

    private static string List(ImmutableArray<Complex> points, Glyphs g)
    {
        if (points.IsEmpty)
        {
            return "none";
        }

        var shown = new List<string>();
        foreach (var z in points.Where(z => z.Imaginary >= 0))
        {
            shown.Add(SpecWording.Location(z, g));
        }

        return string.Join(", ", shown);
    }

    private static string Num(double v) => NumberText.Short(v, 6);
}
