using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Plants;

/// <summary>
/// Files in Plants/BrokenExpressions are valid plant files whose expressions are wrong: the reader accepts them and
/// the loop model refuses them at the exact character, through TOML escapes and multi-line strings. Each expected
/// position was counted by hand on the file.
/// </summary>
public sealed class BrokenExpressionFileTests
{
    private static readonly string Folder = Path.Combine(AppContext.BaseDirectory, "Plants", "BrokenExpressions");

    public static TheoryData<string> Files() => ExpectedErrorLine.FilesIn(Folder);

    [Theory]
    [MemberData(nameof(Files))]
    public void Loading_the_loop_fails_at_the_offending_character(string name)
    {
        var path = Path.Combine(Folder, name);
        var (line, column, message) = ExpectedErrorLine.Of(path);
        var plant = PlantFileReader.Read(path);

        var error = Assert.Throws<PlantFileException>(() => LoopModel.Create(plant)).Error;

        Assert.Equal($"{path}:{line}:{column}: error: {message}", error.ToString());
    }
}
