using System.Text;

namespace TermLocus.Core.Tests.Fuzz;

/// <summary>Named hostile edits of the conveyor demo plant (see <see cref="HostileInputTests"/>).</summary>
internal static class HostileEdits
{
    private const int Deep = 100_000;

    private static readonly string FourHundredDigits = string.Concat(Enumerable.Repeat("1234567890", 40));

    private static readonly Dictionary<string, Func<byte[]>> Edits = new(StringComparer.Ordinal)
    {
        ["value 1e309"] = () => Value("Kt", "1e309"),
        ["value -1e309"] = () => Value("Kt", "-1e309"),
        ["value 400 digits integer"] = () => Value("Kt", FourHundredDigits),
        ["value 400 digits float"] = () => Value("Kt", FourHundredDigits + ".5"),
        ["value nan"] = () => Value("Kt", "nan"),
        ["value inf"] = () => Value("Kt", "inf"),
        ["value -inf"] = () => Value("Kt", "-inf"),
        ["value 1e-400"] = () => Value("Kt", "1e-400"),
        ["value 5e-324"] = () => Value("Kt", "5e-324"),
        ["value 1.7976931348623157e308"] = () => Value("Kt", "1.7976931348623157e308"),
        ["swept value 1e308"] = () => Value("Kp", "1e308"),
        ["range to 1e308"] = () => Replace("range = [0.0, 150.0]", "range = [-1e308, 1e308]"),
        ["range nan"] = () => Replace("range = [0.0, 150.0]", "range = [nan, 150.0]"),
        ["band inf"] = () => Replace("band = [0.30, 0.65]", "band = [0.30, inf]"),
        ["band huge"] = () => Replace("band = [0.30, 0.65]", "band = [-1.7e308, 1.7e308]"),
        ["tolerance_pct huge"] = () => Replace("band = [0.30, 0.65]", "tolerance_pct = 1e308"),
        ["spec nan"] = () => Replace("min_damping = 0.5", "min_damping = nan"),
        ["spec inf"] = () => Replace("max_natural_frequency = 400", "max_natural_frequency = inf"),
        ["spec time 5e-324"] = () => Replace("max_time_to_half = 0.15", "max_time_to_half = 5e-324"),
        ["expression 1e309"] = () => Plant("1e309 * Kt / ((J*s + B) * (tau_i*s + 1))"),
        ["expression 400 digits"] = () => Plant(FourHundredDigits + " * Kt / ((J*s + B) * (tau_i*s + 1))"),
        ["expression 400 fraction digits"] = () => Plant("0." + FourHundredDigits + " * Kt / (J*s + B)"),
        ["expression exponent 1e999999999"] = () => Plant("1e999999999999 * Kt / (J*s + B)"),
        ["expression nan"] = () => Plant("nan * Kt / (J*s + B)"),
        ["expression inf"] = () => Plant("inf * Kt / (J*s + B)"),
        ["expression s^100000"] = () => Plant("Kt / (s^100000 + 1)"),
        ["expression s^-1"] = () => Plant("Kt / (s^-1 + 1)"),
        ["expression s^0.5"] = () => Plant("Kt / (s^0.5 + 1)"),
        ["expression s^1e300"] = () => Plant("Kt / (s^1e300 + 1)"),
        ["expression J^100000"] = () => Plant("Kt / (J^100000*s + 1)"),
        ["expression J^-100000"] = () => Plant("Kt / (J^-100000*s + 1)"),
        ["expression J^1e308"] = () => Plant("Kt / (J^1e308*s + 1)"),
        ["expression 2^2^2^2^2^2"] = () => Plant("Kt / (2^2^2^2^2^2*s + 1)"),
        ["expression exp(1000)"] = () => Plant("Kt / (exp(1000)*s + 1)"),
        ["expression exp(J*1e6)"] = () => Plant("Kt / (exp(J*1e6)*s + 1)"),
        ["expression ln(J-J)"] = () => Plant("Kt / (ln(J-J)*s + 1)"),
        ["expression sqrt(-J)"] = () => Plant("Kt / (sqrt(-J)*s + 1)"),
        ["expression 1/(J-J)"] = () => Plant("Kt / ((1/(J-J))*s + 1)"),
        ["expression 1/(s-s)"] = () => Plant("Kt / (s - s)"),
        ["expression overflow in product"] = () => Plant("Kt / ((1e200*s + 1)*(1e200*s + 1))"),
        ["expression overflow in sum"] = () => Plant("Kt / (1.7e308*s + 1.7e308*s + 1)"),
        ["expression underflow"] = () => Plant("Kt / ((1e-200*s + 1e-200)*(1e-200*s + 1e-200))"),
        ["expression (s+1)^200"] = () => Plant("Kt / (s+1)^200"),
        ["expression (1e3*s+1)^200"] = () => Plant("Kt / (1e3*s+1)^200"),
        ["expression degree 201"] = () => Plant("Kt / (s^100 * s^101 + 1)"),
        ["expression 1000 fractions"] = () => Plant(string.Join(" + ", Enumerable.Repeat("1/(s+1)", 1000))),
        ["expression 30000 terms"] = () => Plant(string.Join(" + ", Enumerable.Repeat("Kt*s", 30_000))),
        ["expression 30000 factors"] = () => Plant(string.Join(" * ", Enumerable.Repeat("Kt", 30_000)) + "/(s+1)"),
        ["expression 30000 divisions"] = () => Plant("Kt" + string.Concat(Enumerable.Repeat("/J", 30_000)) + "/(s+1)"),
        ["expression parentheses 100k deep"] = () => Plant(new string('(', Deep) + "Kt" + new string(')', Deep) + "/(s+1)"),
        ["expression unclosed parentheses 100k"] = () => Plant(new string('(', Deep) + "Kt/(s+1)"),
        ["expression unary minus 100k"] = () => Plant(string.Concat(Enumerable.Repeat("-", Deep)) + "Kt/(s+1)"),
        ["expression power chain 100k"] = () => Plant("Kt/(s+1)" + string.Concat(Enumerable.Repeat("^1", Deep))),
        ["expression sqrt nested 100k"] = () => Plant(string.Concat(Enumerable.Repeat("sqrt(", Deep)) + "Kt" + new string(')', Deep) + "/(s+1)"),
        ["expression name 500k long"] = () => Plant(new string('K', 500_000) + "/(s+1)"),
        ["expression unicode"] = () => Plant("Kt·s / (s² + １)"),
        ["expression bidi override"] = () => Plant("Kt\u202E/(s+1)"),
        ["expression escape sequence"] = () => Plant("Kt\\u001b]0;pwned\\u0007/(s+1)"),
        ["expression ESC in name position"] = () => Plant("\\u001b[2J"),
        ["expression C1 control"] = () => Plant("Kt\\u0085/(s+1)"),
        ["expression lone surrogate escape"] = () => Plant("Kt\\uD800/(s+1)"),
        ["expression implicit multiplication"] = () => Plant("2s"),
        ["characteristic zero"] = () => Characteristic("0*s + Kp - Kp"),
        ["characteristic s-s"] = () => Characteristic("s - s"),
        ["characteristic sub-normal leading coefficient"] = () => Characteristic("1e-310*s + Kp"),
        ["characteristic tiny leading coefficient"] = () => Characteristic("1e-300*s^3 + 1e300*s + Kp"),
        ["plant sub-normal inertia"] = () => Replace("value = 0.42, band = [0.30, 0.65]", "value = 5e-324"),
        ["characteristic constant"] = () => Characteristic("Kp"),
        ["characteristic 1/s"] = () => Characteristic("1/s + Kp"),
        ["characteristic degree 200"] = () => Characteristic("s^200 + Kp"),
        ["characteristic (s+1)^200"] = () => Characteristic("(s+1)^200 + Kp"),
        ["toml arrays 100k deep"] = () => Insert("deep = " + new string('[', Deep) + new string(']', Deep)),
        ["toml unclosed arrays 100k"] = () => Insert("deep = " + new string('[', Deep)),
        ["toml inline tables 100k deep"] = () => Insert("deep = " + string.Concat(Enumerable.Repeat("{a=", Deep)) + "1" + new string('}', Deep)),
        ["toml dotted key 100k"] = () => Insert(string.Join('.', Enumerable.Repeat("a", Deep)) + " = 1"),
        ["toml table header 100k"] = () => Insert("[" + string.Join('.', Enumerable.Repeat("a", Deep)) + "]"),
        ["toml array of tables 50k"] = () => Append(string.Concat(Enumerable.Repeat("[[x]]\n", 50_000))),
        ["toml 20000 parameters"] = () => Replace("[parameters]\n", "[parameters]\n" + string.Concat(Enumerable.Range(0, 20_000).Select(i => $"p{i} = {i}\n"))),
        ["toml 20000 operating points"] = () => Append(string.Concat(Enumerable.Repeat("[[operating_points]]\nname = \"x\"\nvalues = { Kp = 1 }\n", 20_000))),
        ["toml long string"] = () => Replace("title = \"", "title = \"" + new string('x', 900_000)),
        ["toml long comment line"] = () => Insert("# " + new string('x', 1_000_000)),
        ["toml over the size limit"] = () => Insert("# " + new string('x', 2_000_000)),
        ["toml 1e309 integer-like"] = () => Insert("big = 1e309"),
        ["toml 400 digit integer"] = () => Insert("big = " + FourHundredDigits),
        ["toml date 99999"] = () => Insert("when = 99999-12-31T00:00:00Z"),
        ["toml bad escape"] = () => Insert("bad = \"\\x41\""),
        ["toml title with escape sequence"] = () => Replace("title = \"", "title = \"\\u001b]0;pwned\\u0007"),
        ["toml key with escape sequence"] = () => Insert("\"\\u001b[2J\" = 1"),
        ["toml key with bidi"] = () => Insert("\"a\u202Eb\" = 1"),
        ["toml raw ESC in comment"] = () => Insert("# \u001b[2J"),
        ["toml raw ESC in string"] = () => Insert("x = \"\u001b[2J\""),
        ["toml raw DEL in key"] = () => Insert("a\u007Fb = 1"),
        ["toml raw C1 in string"] = () => Insert("x = \"\u0085\""),
        ["bytes NUL"] = () => Bytes(b => b.Insert(40, 0)),
        ["bytes invalid UTF-8"] = () => Bytes(b => b.InsertRange(200, new byte[] { 0xC3, 0x28 })),
        ["bytes lone continuation"] = () => Bytes(b => b.Insert(300, 0x80)),
        ["bytes UTF-16 surrogate encoded"] = () => Bytes(b => b.InsertRange(300, new byte[] { 0xED, 0xA0, 0x80 })),
        ["bytes overlong"] = () => Bytes(b => b.InsertRange(300, new byte[] { 0xC0, 0xAF })),
        ["bytes truncated sequence at end"] = () => Bytes(b => b.Add(0xE2)),
        ["bytes UTF-16 BOM"] = () => Bytes(b => b.InsertRange(0, new byte[] { 0xFF, 0xFE })),
        ["bytes two UTF-8 BOMs"] = () => Bytes(b => b.InsertRange(0, new byte[] { 0xEF, 0xBB, 0xBF, 0xEF, 0xBB, 0xBF })),
        ["bytes lone CR"] = () => Utf8(DemoPlantSeeds.Conveyor.Replace("\n", "\r", StringComparison.Ordinal)),
        ["bytes CRLF mix"] = () => Utf8(MixNewLines(DemoPlantSeeds.Conveyor)),
        ["bytes CRCRLF"] = () => Utf8(DemoPlantSeeds.Conveyor.Replace("\n", "\r\r\n", StringComparison.Ordinal)),
        ["bytes empty"] = () => [],
        ["bytes only BOM"] = () => [0xEF, 0xBB, 0xBF],
        ["bytes U+FFFD"] = () => Utf8(DemoPlantSeeds.Conveyor.Replace("Kt ", "K\uFFFDt ", StringComparison.Ordinal)),
        ["bytes noncharacter U+FFFF"] = () => Utf8(DemoPlantSeeds.Conveyor.Replace("# Invented", "# \uFFFF Invented", StringComparison.Ordinal)),
        ["truncated inside a string"] = () => Utf8(DemoPlantSeeds.Conveyor[..DemoPlantSeeds.Conveyor.IndexOf("Kt / (", StringComparison.Ordinal)]),
        ["truncated inside a multi-line string"] = () => Utf8(DemoPlantSeeds.Conveyor[..300]),
    };

    public static IEnumerable<string> Names => Edits.Keys;

    public static byte[] Build(string name) => Edits[name]();

    private static byte[] Utf8(string text) => Encoding.UTF8.GetBytes(text);

    private static byte[] Replace(string old, string replacement)
    {
        var text = DemoPlantSeeds.Conveyor;
        Assert.Contains(old, text, StringComparison.Ordinal);
        return Utf8(text.Replace(old, replacement, StringComparison.Ordinal));
    }

    private static byte[] Value(string name, string literal)
    {
        var text = DemoPlantSeeds.Conveyor;
        var start = text.IndexOf($"\n{name}", StringComparison.Ordinal) + 1;
        var valueAt = text.IndexOf("value = ", start, StringComparison.Ordinal) + "value = ".Length;
        var end = text.IndexOf(',', valueAt);
        return Utf8(string.Concat(text.AsSpan(0, valueAt), literal, text.AsSpan(end)));
    }

    private static byte[] Plant(string expression) =>
        Replace("plant      = \"Kt / ((J*s + B) * (tau_i*s + 1))\"", $"plant      = \"{expression}\"");

    private static byte[] Characteristic(string expression) =>
        Replace("plant      = \"Kt / ((J*s + B) * (tau_i*s + 1))\"\ncontroller = \"Kp * (s + wi) / s\"", $"characteristic = \"{expression}\"");

    private static byte[] Insert(string line) => Replace("[parameters]\n", line + "\n[parameters]\n");

    private static byte[] Append(string text) => Utf8(DemoPlantSeeds.Conveyor + text);

    private static byte[] Bytes(Action<List<byte>> edit)
    {
        var bytes = Utf8(DemoPlantSeeds.Conveyor).ToList();
        edit(bytes);
        return [.. bytes];
    }

    private static string MixNewLines(string text)
    {
        var builder = new StringBuilder();
        int n = 0;
        foreach (var c in text)
        {
            builder.Append(c == '\n' && n++ % 2 == 0 ? "\r\n" : c.ToString());
        }

        return builder.ToString();
    }
}
