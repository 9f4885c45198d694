using TermLocus.App.Text;
using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

public class BandCheckUpdateTests
{
    [Fact]
    public void Until_the_band_check_arrives_the_status_line_says_it_is_checking()
    {
        var opened = BandPlants.Opened(BandPlants.Quadratic());
        var (stepped, effects) = Update.Apply(opened, Command.StepSweepUp);
        Assert.True(stepped.Session!.CheckPending);
        Assert.Equal("✓ all specs met at K = 5.2; checking the band…", StatusLinePresenter.Verdict(stepped.Session, Glyphs.Unicode));
        var settled = BandPlants.Settle(stepped, effects);
        Assert.StartsWith("! in band:", StatusLinePresenter.Verdict(settled.Session, Glyphs.Unicode), StringComparison.Ordinal);
    }

    [Fact]
    public void A_check_for_a_value_left_behind_is_kept_but_not_shown()
    {
        var opened = BandPlants.Opened(BandPlants.Quadratic());
        var (stepped, effects) = Update.Apply(opened, Command.StepSweepUp);
        var check = CoreBridge.CheckBand(stepped.Session!.Loaded, 7);
        var after = Update.Receive(stepped, check).State;
        Assert.Null(after.Session!.Check);
        Assert.Same(check, after.Session.Checks.Find(7));
        Assert.Single(effects);
    }
}
