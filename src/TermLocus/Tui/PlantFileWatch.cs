using TermLocus.App.Workbench;

namespace TermLocus.Tui;

/// <summary>
/// Tells the workbench when the open plant file is written, replaced, moved or deleted, by another program or by our
/// own save: a file-system watcher on the plant's folder, limited to its name, aimed again whenever another plant is
/// opened. It only says "touched"; whether the bytes changed is decided by comparing hashes off the UI thread. Where
/// nothing can be watched (no watches left, some network shares) the save dialog still looks before writing.
/// </summary>
internal sealed class PlantFileWatch : IDisposable
{
    private readonly WorkbenchController controller;
    private readonly Action<Action> post;
    private FileSystemWatcher? watcher;
    private string? watched;

    /// <param name="controller">Whose open plant is watched and who hears of touches.</param>
    /// <param name="post">Runs an action on the UI thread (the watcher's events arrive on other threads).</param>
    public PlantFileWatch(WorkbenchController controller, Action<Action> post)
    {
        this.controller = controller;
        this.post = post;
        controller.StateChanged += OnStateChanged;
        Follow(controller.State.Session?.Loaded.Plant.Path);
    }

    public void Dispose()
    {
        controller.StateChanged -= OnStateChanged;
        watcher?.Dispose();
        watcher = null;
    }

    private void OnStateChanged(WorkbenchState before, WorkbenchState after) => Follow(after.Session?.Loaded.Plant.Path);

    private void Follow(string? path)
    {
        if (path == watched)
        {
            return;
        }

        watcher?.Dispose();
        watcher = null;
        watched = path;
        if (path is null)
        {
            return;
        }

        try
        {
            string full = Path.GetFullPath(path);
            var next = new FileSystemWatcher(Path.GetDirectoryName(full)!, Path.GetFileName(full))
            {
                NotifyFilter = NotifyFilters.FileName | NotifyFilters.LastWrite | NotifyFilters.Size,
                IncludeSubdirectories = false,
            };
            void Touched(object? sender, FileSystemEventArgs e) => post(() => controller.Receive(new PlantFileTouched(path)));
            next.Changed += Touched;
            next.Created += Touched;
            next.Deleted += Touched;
            next.Renamed += Touched;
            next.EnableRaisingEvents = true;
            watcher = next;
        }
        catch (Exception e) when (e is IOException or ArgumentException or UnauthorizedAccessException or PlatformNotSupportedException)
        {
            // Not watchable: the save dialog still compares the file before writing.
        }
    }
}
