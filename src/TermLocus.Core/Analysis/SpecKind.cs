namespace TermLocus.Core.Analysis;

/// <summary>
/// The limits of a plant file's <c>[specs]</c> table: all but <see cref="MaxOvershootPct"/> are checked on the
/// closed-loop poles; overshoot is checked on the simulated step response. The declaration order is the order reports
/// list them in.
/// </summary>
public enum SpecKind
{
    /// <summary><c>min_damping</c>: every pole's damping ratio ζ at least the limit (dimensionless).</summary>
    MinDamping,

    /// <summary><c>min_decay_rate</c>: every pole's decay rate σ = -Re(s) at least the limit (1/s).</summary>
    MinDecayRate,

    /// <summary><c>max_time_to_half</c>: every pole's time to half amplitude ln2/σ at most the limit (s).</summary>
    MaxTimeToHalf,

    /// <summary><c>max_settling_time</c>: every pole's 2 % settling estimate 4/σ at most the limit (s).</summary>
    MaxSettlingTime,

    /// <summary><c>min_natural_frequency</c>: every pole's ωn = |s| at least the limit (rad/s).</summary>
    MinNaturalFrequency,

    /// <summary><c>max_natural_frequency</c>: every pole's ωn = |s| at most the limit (rad/s).</summary>
    MaxNaturalFrequency,

    /// <summary><c>max_overshoot_pct</c>: largest step-response overshoot, percent; checked on the simulated response, not on poles.</summary>
    MaxOvershootPct,
}
