using System.Text;

namespace TermLocus.Core.Tests.Fuzz;

/// <summary>
/// Hand-written hostile plant files, each derived from the conveyor demo by one edit. The rule (plant-file design:
/// "errors name the file, line and column"; terminal-ux design point 8: text from files is untrusted): each either
/// loads and solves or fails with a one-line, located <see cref="TermLocus.Core.Plants.PlantFileException"/> without
/// control characters, in bounded time and stack. Every case here broke that rule before the fix named beside it.
/// </summary>
public sealed class HostileInputTests
{
    public static TheoryData<string> Cases() => [.. HostileEdits.Names];

    [Theory]
    [MemberData(nameof(Cases))]
    public void A_hostile_file_loads_or_fails_with_a_located_one_line_error(string name)
    {
        var bytes = HostileEdits.Build(name);
        using var session = new FuzzSession("hostile " + name);

        session.Run(() => PlantPipeline.Run(bytes), () => name + ": " + Encoding.UTF8.GetString(bytes));
    }
}
