namespace TermLocus;

/// <summary>Entry point of the <c>termlocus</c> executable.</summary>
public static class Program
{
    /// <summary>Runs the command line and returns its exit code.</summary>
    public static int Main(string[] args)
    {
        Console.Out.WriteLine("termlocus: under construction");
        return args.Length == 0 ? 0 : 2;
    }
}
