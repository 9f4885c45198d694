using TermLocus.CrashDriver;

// Saves over and over until it is killed, saying on stdout where it is ("ready", "begin K", "done K") so that the
// test that kills it knows whether the SIGKILL landed inside a save. Usage:
//   replace  TARGET VERSIONS_FOLDER FIRST [--in-place]   AtomicFileSaver.TrySave of v0.bin, v1.bin, ... in turn
//   recovery PLANT FIRST [--in-place]                     the workbench's recovery effect, RecoverySchedule in turn
// --in-place writes the same bytes with File.WriteAllBytes over the file instead, which is NOT atomic: the tests use
// it to show that the harness catches a torn file.
if (args.Length < 3)
{
    Console.Error.WriteLine("usage: replace TARGET VERSIONS FIRST [--in-place] | recovery PLANT FIRST [--in-place]");
    return 2;
}

bool inPlace = args.Contains("--in-place");
return args[0] switch
{
    "replace" when args.Length >= 4 => ReplaceLoop.Run(args[1], args[2], long.Parse(args[3], System.Globalization.CultureInfo.InvariantCulture), inPlace),
    "recovery" when !OperatingSystem.IsWindows() => RecoveryLoop.Run(args[1], long.Parse(args[2], System.Globalization.CultureInfo.InvariantCulture), inPlace),
    _ => 2,
};
