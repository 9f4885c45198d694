using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Plants;

/// <summary>
/// Every file in Plants/Broken holds one mistake and states the error it must produce, either on its first line
/// (<c># expect: LINE:COL: MESSAGE</c>) or in a sibling <c>.expected</c> file. Positions were checked by hand against
/// the file; the form FILE:LINE:COL: error: MESSAGE is the compilers' convention (common practice).
/// </summary>
public sealed class BrokenPlantFileTests
{
    private static readonly string Folder = Path.Combine(AppContext.BaseDirectory, "Plants", "Broken");

    public static TheoryData<string> BrokenFiles() => ExpectedErrorLine.FilesIn(Folder);

    [Fact]
    public void The_suite_has_at_least_thirty_broken_files()
    {
        Assert.True(Directory.GetFiles(Folder, "*.toml").Length >= 30);
    }

    [Theory]
    [MemberData(nameof(BrokenFiles))]
    public void Reading_a_broken_file_fails_with_its_expected_located_error(string name)
    {
        var path = Path.Combine(Folder, name);
        var (line, column, message) = ExpectedErrorLine.Of(path);

        // Assert.Throws demands exactly this type: any other exception escaping the reader fails the test.
        var error = Assert.Throws<PlantFileException>(() => PlantFileReader.Read(path)).Error;

        Assert.Equal($"{path}:{line}:{column}: error: {message}", error.ToString());
        Assert.Equal(new SourcePosition(line, column), error.Position);
    }

    [Theory]
    [MemberData(nameof(BrokenFiles))]
    public void Parsing_the_same_bytes_in_memory_gives_the_same_error(string name)
    {
        var path = Path.Combine(Folder, name);
        var bytes = File.ReadAllBytes(path);

        var fromDisk = Assert.Throws<PlantFileException>(() => PlantFileReader.Read(path)).Error;
        var fromMemory = Assert.Throws<PlantFileException>(() => PlantFileReader.ParseDocument(bytes, path)).Error;

        Assert.Equal(fromDisk, fromMemory);
    }

    [Theory]
    [MemberData(nameof(BrokenFiles))]
    public void Every_error_is_one_line_without_control_characters(string name)
    {
        var error = Assert.Throws<PlantFileException>(() => PlantFileReader.Read(Path.Combine(Folder, name))).Error;

        Assert.DoesNotContain(error.Message, c => char.IsControl(c));
    }
}
