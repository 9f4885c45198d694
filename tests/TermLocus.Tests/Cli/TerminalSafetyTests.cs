using System.CommandLine;
using System.Text.Json;
using TermLocus.Cli;

namespace TermLocus.Tests.Cli;

/// <summary>
/// No text from a plant file (or a file name, or an error quoting either) may put a control character on stdout or
/// stderr, for every verb and output form. The earlier version of this suite looked at stdout of four text verbs only,
/// with hostile text in the title and the unit: it never ran design, trace or save, never looked at stderr or at the
/// error paths, never put hostile text in notes or operating points, and let a bidi override through in JSON.
/// </summary>
public class TerminalSafetyTests
{
    // OSC 52 (write the clipboard), an erase-screen CSI, a C1 CSI (0x9B), a colour CSI, BEL, NUL and a bidi override
    // (common practice: the sequences terminals act on, ECMA-48 and the Unicode bidi controls).
    private const string Raw = "\u001b]52;c;ZXZpbA==\u0007\u001b[2J\u009b31m\u001b[31mRED\u0007\u0000\u202eevil";

    // The same text spelled as TOML escapes.
    private const string Toml = "\\u001b]52;c;ZXZpbA==\\u0007\\u001b[2J\\u009b31m\\u001b[31mRED\\u0007\\u0000\\u202eevil";

    /// <summary>Every verb's every output form; <see cref="Every_verb_of_the_catalog_is_covered"/> keeps it complete.</summary>
    private static readonly string[][] Forms =
    [
        ["check"], ["check", "--json"],
        ["analyze"], ["analyze", "--json"],
        ["design"], ["design", "--json"],
        ["trace"], ["trace", "--csv"], ["trace", "--json"],
        ["plot"],
        ["response"], ["response", "--json"],
        ["save", "--name", Raw, "--note", Raw],
    ];

    public static TheoryData<string[]> VerbForms()
    {
        var data = new TheoryData<string[]>();
        foreach (var form in Forms)
        {
            data.Add(form);
        }

        return data;
    }

    private static string HostilePlant() => RepoFiles.TempPlant($$"""
        title = "{{Toml}}"
        note = "{{Toml}}"
        [parameters]
        K = { value = 1.0, range = [0.0, 20.0], unit = "{{Toml}}", note = "{{Toml}}" }
        a = { value = 2.0, tolerance_pct = 10, unit = "{{Toml}}", note = "{{Toml}}" }
        [loop]
        plant = "K / (s*(s + 1)*(s + a))"
        sweep = "K"
        vary = "a"
        [specs]
        min_damping = 0.3
        max_settling_time = 30
        max_overshoot_pct = 40

        [[operating_points]]
        name = "{{Toml}}"
        saved = 2026-01-02T03:04:05Z
        by = "{{Toml}}"
        values = { K = 1.0 }
        verdict = "{{Toml}}"
        note = "{{Toml}}"
        """);

    [Theory]
    [MemberData(nameof(VerbForms))]
    public void No_control_character_from_a_plant_file_reaches_stdout_or_stderr(string[] form)
    {
        var (code, stdout, stderr) = CliRunner.Run([form[0], HostilePlant(), .. form[1..]]);
        string label = string.Join(' ', form[..Math.Min(2, form.Length)]);
        Assert.True(code is 0 or 1, $"{label}: exit {code}: {stderr}");
        AssertNoControl(stdout, label + " stdout");
        AssertNoControl(stderr, label + " stderr");
    }

    [Theory]
    [MemberData(nameof(VerbForms))]
    public void Json_stays_valid_and_carries_the_file_text_unchanged(string[] form)
    {
        if (!form.Contains("--json"))
        {
            return;
        }

        var (_, stdout, _) = CliRunner.Run([form[0], HostilePlant(), .. form[1..]]);
        using var doc = JsonDocument.Parse(stdout);
        var root = doc.RootElement.TryGetProperty("plants", out var plants) ? plants[0] : doc.RootElement;
        if (root.TryGetProperty("title", out var title))
        {
            // Escaped for the terminal, not altered: a JSON reader gets the title back character for character.
            Assert.Equal(Raw, title.GetString());
        }
    }

    [Fact]
    public void Every_verb_of_the_catalog_is_covered()
    {
        var context = new CliContext(TextWriter.Null, TextWriter.Null, new Dictionary<string, string?>(), false);
        var names = VerbCatalog.All().Select(v => v.Build(context).Name).ToHashSet();
        var covered = Forms.Select(form => form[0]).ToHashSet();
        Assert.Equal(names.Order(), covered.Order());
    }

    [Fact]
    public void Error_messages_quoting_file_names_keys_expressions_and_folders_show_their_controls()
    {
        string dir = Path.GetDirectoryName(HostilePlant())!;
        string hostileFolder = Path.Combine(dir, "folder" + Raw.Replace("\u0000", "", StringComparison.Ordinal));
        Directory.CreateDirectory(hostileFolder);
        var runs = new[]
        {
            CliRunner.Run("check", Path.Combine(dir, Raw.Replace("\u0000", "", StringComparison.Ordinal) + ".toml")),
            CliRunner.Run("check", hostileFolder),
            CliRunner.Run("check", RepoFiles.TempPlant($"title = \"x\"\n\"{Toml}\" = 1\n")),
            CliRunner.Run("analyze", RepoFiles.TempPlant($$"""
                title = "x"
                [parameters]
                K = { value = 1.0, range = [0.0, 2.0] }
                [loop]
                plant = "K / (s {{Toml}})"
                sweep = "K"
                """)),
            CliRunner.Run("response", HostilePlant(), "--set", Raw + "=1"),
        };
        foreach (var (code, stdout, stderr) in runs)
        {
            Assert.Equal(2, code);
            Assert.Equal("", stdout);
            Assert.NotEqual("", stderr);
            AssertNoControl(stderr, "stderr");
        }
    }

    [Fact]
    public void A_verb_that_writes_raw_text_is_still_caught_at_the_streams()
    {
        // Any verb, present or future, writes through the context CliApp hands it; that context is the guard.
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        var context = new CliContext(stdout, stderr, new Dictionary<string, string?>(), false);
        var app = new CliApp(context, _ => 0, [new RawVerb()]);
        Assert.Equal(0, app.Run(["raw"]));
        AssertNoControl(stdout.ToString(), "stdout");
        AssertNoControl(stderr.ToString(), "stderr");
        Assert.Contains("^[]52;c;ZXZpbA==^G^[[2J<U+009B>31m^[[31mRED^G^@<U+202E>evil", stdout.ToString(), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("a\nb", "a\nb")]
    [InlineData("a\r\nb", "a\r\nb")]
    [InlineData("a\rb", "a^Mb")]
    [InlineData("\u001b[2J", "^[[2J")]
    [InlineData("\u009b31m", "<U+009B>31m")]
    [InlineData("\u202eevil", "<U+202E>evil")]
    [InlineData("\u007f", "^?")]
    [InlineData("ζ ± \U0001F600", "ζ ± \U0001F600")]
    public void The_guard_keeps_line_breaks_and_letters_and_shows_controls(string text, string expected) =>
        Assert.Equal(expected, TerminalSafeWriter.Clean(text));

    private static void AssertNoControl(string text, string label)
    {
        for (int i = 0; i < text.Length; i++)
        {
            char c = text[i];
            bool control = (c < 0x20 && c != '\n') || (c >= 0x7F && c <= 0x9F)
                || (c >= '\u202A' && c <= '\u202E') || (c >= '\u2066' && c <= '\u2069')
                || c is '\u200E' or '\u200F' or '\u061C' or '\u2028' or '\u2029';
            Assert.False(control, $"{label} has U+{(int)c:X4} at {i}: {text[Math.Max(0, i - 40)..Math.Min(text.Length, i + 40)]}");
        }
    }

    private sealed class RawVerb : IVerb
    {
        public Command Build(CliContext context)
        {
            var command = new Command("raw", "writes raw text");
            command.SetAction(_ =>
            {
                context.Out.WriteLine(Raw);
                context.Out.Write(Raw.ToCharArray(), 0, Raw.Length);
                foreach (char c in Raw)
                {
                    context.Error.Write(c);
                }

                return 0;
            });
            return command;
        }
    }
}
