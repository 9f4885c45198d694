using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

public class SaveAsNamesTests
{
    [Theory]
    [InlineData("/plants/crane.toml", "/plants/crane.2.toml")]
    [InlineData("plants/crane.toml", "plants/crane.2.toml")] // relative stays relative
    [InlineData("crane.toml", "crane.2.toml")]
    [InlineData("/plants/crane.2.toml", "/plants/crane.3.toml")] // goes on from the number it has
    [InlineData("/plants/crane.TOML", "/plants/crane.2.toml")]
    [InlineData("/plants/v1.5.toml", "/plants/v1.6.toml")]
    public void The_first_free_name_beside_the_plant(string plant, string expected) =>
        Assert.Equal(expected, SaveAsNames.Suggest(plant, _ => false));

    [Fact]
    public void Taken_names_are_skipped()
    {
        var taken = new HashSet<string> { "/plants/crane.2.toml", "/plants/crane.3.toml" };
        Assert.Equal("/plants/crane.4.toml", SaveAsNames.Suggest("/plants/crane.toml", taken.Contains));
    }

    [Fact]
    public void When_every_number_is_taken_the_first_is_offered_and_the_save_will_say_it_exists()
    {
        Assert.Equal("/plants/crane.2.toml", SaveAsNames.Suggest("/plants/crane.toml", _ => true));
    }

    [Theory]
    [InlineData("a.toml", true)]
    [InlineData("dir/A.Toml", true)]
    [InlineData("a.toml.recovery", false)]
    [InlineData(".toml", false)]
    [InlineData("a.txt", false)]
    public void Plant_file_names_end_in_toml(string path, bool expected) =>
        Assert.Equal(expected, SaveAsNames.IsPlantFileName(path));
}
