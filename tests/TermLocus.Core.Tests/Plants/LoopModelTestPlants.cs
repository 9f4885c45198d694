using System.Collections.Immutable;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Plants;

/// <summary>Builds Plant records in code (no TOML), with inline expression text.</summary>
internal static class LoopModelTestPlants
{
    public const string FileName = "loop.toml";

    public static Plant Loop(
        (string Name, double Value)[] parameters,
        string? plant,
        string? controller = null,
        string? sensor = null,
        FeedbackSign feedback = FeedbackSign.Negative,
        string? characteristic = null,
        string? sweep = null,
        double? delay = null,
        double? sampleTime = null)
    {
        var list = parameters
            .Select((p, i) => new Parameter(p.Name, p.Value, null, null, string.Empty, string.Empty, new SourcePosition(3 + i, 1)))
            .ToImmutableArray();
        var loop = new LoopDefinition(
            Inline("plant", plant),
            Inline("controller", controller),
            Inline("sensor", sensor),
            feedback,
            Inline("characteristic", characteristic),
            sweep ?? parameters[0].Name,
            null,
            delay,
            sampleTime);
        return new Plant(FileName, "test loop", string.Empty, list, loop, Specs.None, []);
    }

    public static LoopModel Model(
        (string Name, double Value)[] parameters,
        string? plant,
        string? controller = null,
        string? sensor = null,
        FeedbackSign feedback = FeedbackSign.Negative,
        string? characteristic = null) =>
        LoopModel.Create(Loop(parameters, plant, controller, sensor, feedback, characteristic));

    /// <summary>A model of a continuous loop with a transport delay (seconds) and optional model options.</summary>
    public static LoopModel Delayed(
        (string Name, double Value)[] parameters,
        string plant,
        double delay,
        string? controller = null,
        string? sensor = null,
        FeedbackSign feedback = FeedbackSign.Negative,
        LoopModelOptions? options = null) =>
        LoopModel.Create(Loop(parameters, plant, controller, sensor, feedback, delay: delay), options ?? LoopModelOptions.Default);

    /// <summary>A model of a sampled loop (controller in z) with an optional delay in seconds.</summary>
    public static LoopModel Sampled(
        (string Name, double Value)[] parameters,
        string? plant,
        double sampleTime,
        string? controller = null,
        string? sensor = null,
        double? delay = null,
        string? characteristic = null,
        string? sweep = null) =>
        LoopModel.Create(Loop(parameters, plant, controller, sensor, FeedbackSign.Negative, characteristic, sweep, delay, sampleTime));

    public static Dictionary<string, double> Values(params (string Name, double Value)[] values) =>
        values.ToDictionary(v => v.Name, v => v.Value, StringComparer.Ordinal);

    /// <summary>Asserts ascending coefficients equal within an absolute tolerance.</summary>
    public static void AssertCoefficients(double[] expectedAscending, TermLocus.Core.Algebra.Polynomial actual, double tolerance)
    {
        Assert.Equal(expectedAscending.Length - 1, actual.Degree);
        for (int k = 0; k < expectedAscending.Length; k++)
        {
            Assert.Equal(expectedAscending[k], actual[k], tolerance);
        }
    }

    private static ExpressionText? Inline(string key, string? text) => text is null ? null : ExpressionText.Inline(key, text);
}
