namespace TermLocus.Benchmarks;

/// <summary>
/// An invented plant file for the benchmarks: a PI loop with a roll-off filter around a drive with two lightly damped
/// modes, giving a degree-10 characteristic polynomial, with six toleranced parameters (64 band corners). Every
/// number is made up; it describes no real machine.
/// </summary>
internal static class FlexibleDrivePlant
{
    /// <summary>Degree of the closed loop's characteristic polynomial.</summary>
    public const int Degree = 10;

    /// <summary>Toleranced parameters (the band has 2^6 corners).</summary>
    public const int TolerancedCount = 6;

    private const string Text = """
        # Invented example for the benchmarks: every number is made up; it describes no real machine.
        title = "Flexible drive with two resonances (benchmark)"
        note = "Degree-10 closed loop: PI with a roll-off filter around a drive with two lightly damped modes."

        [parameters]
        Kp  = { value = 0.5, range = [0.0, 4.0], note = "swept gain" }
        wi  = { value = 1.0, unit = "rad/s", note = "integral corner" }
        tf  = { value = 0.002, unit = "s", note = "roll-off filter" }
        K0  = { value = 20.0, note = "plant gain" }
        z1  = { value = 20.0, unit = "rad/s", note = "plant zero" }
        p1  = { value = 5.0, band = [4.0, 6.0], unit = "rad/s", note = "rigid-body pole" }
        wa  = { value = 40.0, band = [36.0, 44.0], unit = "rad/s", note = "first mode" }
        za  = { value = 0.05, band = [0.03, 0.07], note = "first mode damping" }
        wb  = { value = 120.0, band = [110.0, 130.0], unit = "rad/s", note = "second mode" }
        zb  = { value = 0.02, band = [0.01, 0.03], note = "second mode damping" }
        t1  = { value = 0.01, band = [0.008, 0.012], unit = "s", note = "actuator lag" }
        t2  = { value = 0.001, unit = "s", note = "sensor lag" }

        [loop]
        plant      = "K0 * wa^2 * wb^2 * (s/z1 + 1) / (s * (s + p1) * (s^2 + 2*za*wa*s + wa^2) * (s^2 + 2*zb*wb*s + wb^2) * (t1*s + 1) * (t2*s + 1))"
        controller = "Kp * (s + wi) / s / (tf*s + 1)"
        sweep = "Kp"
        vary  = "wa"

        [specs]
        min_damping = 0.01
        max_time_to_half = 2.0
        max_natural_frequency = 2000
        """;

    /// <summary>Writes the plant into a new temporary folder and returns the file's path.</summary>
    public static string WriteToTemporaryFolder()
    {
        string folder = Directory.CreateDirectory(
            Path.Combine(Path.GetTempPath(), "termlocus-bench-" + Guid.NewGuid().ToString("N"))).FullName;
        string path = Path.Combine(folder, "flexible-drive.toml");
        File.WriteAllText(path, Text);
        return path;
    }

    /// <summary>Removes the folder made by <see cref="WriteToTemporaryFolder"/>.</summary>
    public static void Delete(string path) => Directory.Delete(Path.GetDirectoryName(path)!, recursive: true);
}
