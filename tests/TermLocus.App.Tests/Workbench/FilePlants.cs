using System.Collections.Immutable;
using System.Security.Cryptography;
using System.Text;
using TermLocus.App.Workbench;
using TermLocus.Core.Plants;

namespace TermLocus.App.Tests.Workbench;

/// <summary>Hand-built plants that look read from a file (a document with bytes and hash), for file-state tests.</summary>
internal static class FilePlants
{
    public const string Path = TestPlants.Folder + "/second.toml";

    /// <summary><see cref="TestPlants.SecondOrder"/> with a document of <paramref name="text"/> (hashed with SHA-256).</summary>
    public static LoadedPlant SecondOrder(string text = "# as loaded\n", string path = Path)
    {
        var loaded = TestPlants.SecondOrder(path: path);
        byte[] bytes = Encoding.UTF8.GetBytes(text);
        var document = new PlantDocument(path, [.. bytes], [.. SHA256.HashData(bytes)], false, "\n", text, loaded.Plant);
        return loaded with { Document = document };
    }

    /// <summary>A state with <see cref="SecondOrder"/> open, K stepped from 5 to 5.2 (unsaved).</summary>
    public static WorkbenchState Unsaved()
    {
        var (start, _) = Update.Start(null, TestPlants.Folder);
        var opened = Update.Receive(start, new PlantLoaded(SecondOrder())).State with { Message = null };
        return Update.Apply(opened, Command.StepSweepUp).State;
    }

    /// <summary>The hash of the open document.</summary>
    public static ImmutableArray<byte> Sha(WorkbenchState state) => state.Session!.Loaded.Document!.Sha256;

    /// <summary><paramref name="state"/> after the worker says the file on disk is <paramref name="disk"/>.</summary>
    public static WorkbenchState Checked(WorkbenchState state, FileOnDisk disk, string suggested = TestPlants.Folder + "/second.2.toml") =>
        Update.Receive(state, new PlantFileChecked(Path, Sha(state), disk, suggested)).State;

    /// <summary>Applies commands; the final state and the last command's effects.</summary>
    public static (WorkbenchState State, ImmutableArray<Effect> Effects) Run(WorkbenchState state, params Command[] commands) =>
        TestPlants.Run(state, commands);

    /// <summary>Types <paramref name="text"/> into the box on top.</summary>
    public static WorkbenchState Type(WorkbenchState state, string text)
    {
        foreach (char c in text)
        {
            state = Update.Receive(state, new CharacterTyped(c)).State;
        }

        return state;
    }
}
