using TermLocus.Cli;

namespace TermLocus.Tests.Cli;

public class CliAppTests
{
    [Fact]
    public void An_unknown_option_is_a_usage_error_with_one_line_and_no_stdout()
    {
        var (code, stdout, stderr) = CliRunner.Run("--bogus");
        Assert.Equal(2, code);
        Assert.Equal("", stdout);
        Assert.Single(stderr.TrimEnd('\n').Split('\n'));
        Assert.Contains("unknown option '--bogus'", stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void No_verb_opens_the_workbench_with_the_given_path_and_options()
    {
        WorkbenchRequest? seen = null;
        var (code, _, _) = CliRunner.RunWith(r => { seen = r; return 0; }, "plants", "--symbols", "ascii", "--no-color");
        Assert.Equal(0, code);
        Assert.Equal(new WorkbenchRequest("plants", true, "ascii", false), seen);
    }

    [Fact]
    public void A_bad_symbols_value_is_rejected()
    {
        var (code, stdout, _) = CliRunner.Run("--symbols", "emoji");
        Assert.Equal(2, code);
        Assert.Equal("", stdout);
    }

    [Fact]
    public void Set_values_parse_in_invariant_culture_and_reject_garbage()
    {
        var values = ValueOverrides.Parse(["Kc=1.5", "B=2e-3", "Kc=2"]);
        Assert.Equal(2.0, values["Kc"]);
        Assert.Equal(0.002, values["B"]);
        Assert.Throws<UsageException>(() => ValueOverrides.Parse(["Kc"]));
        Assert.Throws<UsageException>(() => ValueOverrides.Parse(["Kc=1,5"]));
        Assert.Throws<UsageException>(() => ValueOverrides.Parse(["Kc=NaN"]));
    }
}

public class CliHelpTests
{
    [Fact]
    public void Root_help_lists_the_verbs_and_the_workbench_keys_from_the_key_table()
    {
        var (code, stdout, _) = CliRunner.Run("--help");
        Assert.Equal(0, code);
        foreach (var verb in new[] { "check", "analyze", "trace", "plot", "response", "save" })
        {
            Assert.Contains(verb, stdout, StringComparison.Ordinal);
        }

        Assert.Contains("Workbench keys:", stdout, StringComparison.Ordinal);
        foreach (var binding in TermLocus.App.Workbench.KeyMap.Bindings.Select(b => b.Description).Distinct())
        {
            Assert.Contains(binding, stdout.Replace("\n  ", " ", StringComparison.Ordinal), StringComparison.Ordinal);
        }

        Assert.Contains("no substitute for", stdout, StringComparison.Ordinal);
    }
}
