using System.Collections.Immutable;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

#pragma warning disable CS8524 // every named value is handled; see Update.

/// <summary>The help text, generated from the key table, ending with the caution about models and real hardware.</summary>
public static class HelpPresenter
{
    /// <summary>The narrowest width help is laid out for.</summary>
    public const int MinimumWidth = 40;

    /// <summary>The caution every user must see.</summary>
    public const string Caution =
        "Caution: TermLocus computes with the model you give it. A model's results are no substitute for a safe " +
        "commissioning procedure on the real hardware, for local codes and regulations, or for licensed engineering " +
        "practice. Step gains on live equipment only with limits, guards and an emergency stop in place.";

    private const int KeyColumn = 20;

    /// <summary>The scopes in the order help lists them.</summary>
    public static ImmutableArray<Scope> ScopeOrder { get; } =
        [
            Scope.Main, Scope.PlanePane, Scope.PolesPane, Scope.Library, Scope.ValueEntry, Scope.SaveDialog, Scope.SaveConflict,
            Scope.SaveAs, Scope.Recovery, Scope.QuitConfirm, Scope.Help, Scope.Everywhere,
        ];

    /// <summary>The most lines help can have (at <see cref="MinimumWidth"/>); scrolling stops there.</summary>
    public static int LineCount { get; } = Lines(Glyphs.Unicode, MinimumWidth).Length;

    /// <summary>Every help line, none wider than <paramref name="width"/> (at least <see cref="MinimumWidth"/>).</summary>
    public static ImmutableArray<string> Lines(Glyphs glyphs, int width)
    {
        width = Math.Max(width, MinimumWidth);
        var lines = ImmutableArray.CreateBuilder<string>();
        lines.AddRange(Wrap(KeysHeading(), width));
        foreach (var scope in ScopeOrder.Where(s => KeyMap.Bindings.Any(b => b.Scope == s)))
        {
            lines.Add(string.Empty);
            lines.Add(ScopeTitle(scope));
            foreach (var command in KeyMap.Bindings.Where(b => b.Scope == scope).Select(b => b.Command).Distinct())
            {
                var bindings = KeyMap.Bindings.Where(b => b.Scope == scope && b.Command == command).ToList();
                string keys = string.Join("  ", bindings.Select(b => b.Key.Name(glyphs)));
                lines.Add("  " + TextWidth.PadRight(keys, Math.Max(KeyColumn - 2, TextWidth.Of(keys) + 2)) + bindings[0].Description);
            }
        }

        lines.Add(string.Empty);
        lines.AddRange(Wrap(Caution, width));
        return lines.Select(l => TextWidth.Of(l) > width ? TextWidth.Cut(l, width) : l).ToImmutableArray();
    }

    /// <summary>
    /// The first help line, read off the key table: which keys are capitals typed with Shift, which take Ctrl, and that
    /// nothing needs Alt or a modifier with an arrow.
    /// </summary>
    public static string KeysHeading()
    {
        var chords = KeyMap.Bindings.Select(b => b.Key).Where(k => k.Special == SpecialKey.None).Distinct().ToList();
        var capitals = chords.Where(k => !k.Ctrl && char.IsUpper(k.Character)).Select(k => k.Character.ToString()).Distinct().Order(StringComparer.Ordinal);
        var ctrl = chords.Where(k => k.Ctrl).Select(k => "Ctrl+" + char.ToUpperInvariant(k.Character)).Distinct();
        string shift = capitals.Any() ? $"capital letters ({string.Join(" ", capitals)}) are typed with Shift" : "no key needs Shift";
        string control = ctrl.Any() ? $"Ctrl is only for {string.Join(" and ", ctrl)}" : "no key needs Ctrl";
        return $"Keys: {shift}; {control}; no key needs Alt, and arrows need no modifier";
    }

    /// <summary>A heading for each scope.</summary>
    public static string ScopeTitle(Scope scope) => scope switch
    {
        Scope.Main => "Main screen",
        Scope.PlanePane => "When the s-plane has focus (Tab)",
        Scope.PolesPane => "When the pole table has focus (Tab)",
        Scope.Library => "Plant library (o)",
        Scope.ValueEntry => "Value box (=): type a number such as 1.25 or 4.7e-3",
        Scope.SaveDialog => "Save dialog (s): type the name, Tab, type the note",
        Scope.SaveConflict => "When the plant file changed on disk or is gone (s asks)",
        Scope.SaveAs => "Save under another name: type the new file's path",
        Scope.Recovery => "Recovery file found on opening a plant",
        Scope.QuitConfirm => "Quit question (asked when the value is unsaved)",
        Scope.Help => "Help (?)",
        Scope.Everywhere => "Everywhere",
    };

    /// <summary>
    /// Words of <paramref name="text"/> wrapped to lines of at most <paramref name="width"/> columns. A phrase in
    /// parentheses ("(with zh -25 %)") and a "%" after its number stay on one line when they fit on one.
    /// </summary>
    public static IEnumerable<string> Wrap(string text, int width)
    {
        var line = new System.Text.StringBuilder();
        foreach (var unit in Units(text, width))
        {
            if (line.Length > 0 && line.Length + 1 + unit.Length > width)
            {
                yield return line.ToString();
                line.Clear();
            }

            line.Append(line.Length > 0 ? " " : string.Empty).Append(unit);
        }

        if (line.Length > 0)
        {
            yield return line.ToString();
        }
    }

    // Words, with a parenthesised phrase and a unit "%" joined to what they belong to; a joined unit too wide for
    // a line falls back to its words.
    private static IEnumerable<string> Units(string text, int width)
    {
        var units = new List<string>();
        int open = 0;
        foreach (var word in text.Split(' ', StringSplitOptions.RemoveEmptyEntries))
        {
            bool joins = units.Count > 0 && (open > 0 || word == "%" || word.StartsWith("%)", StringComparison.Ordinal));
            units.Add(joins ? units[^1] + " " + word : word);
            if (joins)
            {
                units.RemoveAt(units.Count - 2);
            }

            open = Math.Max(0, open + word.Count(c => c == '(') - word.Count(c => c == ')'));
        }

        return units.SelectMany(u => u.Length > width ? u.Split(' ') : [u]);
    }
}
