using System.Collections.Immutable;

namespace TermLocus.Core.Plants;

/// <summary>
/// The plant's parameters numbered in file order, with their nominal values: the array layout every loop
/// evaluation uses instead of dictionaries.
/// </summary>
internal sealed class ParameterSlots
{
    private readonly Dictionary<string, int> slotByName = new(StringComparer.Ordinal);
    private readonly double[] nominal;

    public ParameterSlots(ImmutableArray<Parameter> parameters)
    {
        nominal = new double[parameters.Length];
        for (int i = 0; i < parameters.Length; i++)
        {
            slotByName.TryAdd(parameters[i].Name, i);
            nominal[i] = parameters[i].Value;
        }
    }

    public IReadOnlyDictionary<string, int> SlotByName => slotByName;

    /// <summary>The slot of a parameter.</summary>
    /// <exception cref="ArgumentException">No parameter has that name.</exception>
    public int SlotOf(string name) =>
        slotByName.TryGetValue(name, out int slot)
            ? slot
            : throw new ArgumentException($"'{name}' is not a parameter of this plant.", nameof(name));

    /// <summary>A fresh array of values: the nominal ones, overridden by <paramref name="values"/>.</summary>
    /// <exception cref="ArgumentException">A name that is not a parameter, or a value that is not finite.</exception>
    public double[] Resolve(IReadOnlyDictionary<string, double> values)
    {
        ArgumentNullException.ThrowIfNull(values);
        var result = (double[])nominal.Clone();
        foreach (var (name, value) in values)
        {
            if (!double.IsFinite(value))
            {
                throw new ArgumentException($"The value of '{name}' is not finite.", nameof(values));
            }

            result[SlotOf(name)] = value;
        }

        return result;
    }
}
