using MathNet.Numerics.LinearAlgebra;

namespace TermLocus.Core.Time;

/// <summary>
/// What one sample interval of a held plant does, precomputed: the state carried to the next sample instant, and the
/// plant output at <c>P</c> equally spaced offsets σⱼ = j·T/P (j = 0..P − 1) inside the interval, each as a row times
/// the state at the interval's start plus gains on the two held inputs.
/// <para>With a delay remainder τ' (0 &lt;= τ' &lt; T) the plant input is the older held value v_old on [kT, kT + τ')
/// and the newer v_new after it; without one it is v_new throughout. So
/// x(kT + σ) = Φ(σ)·x + Γ(σ)·v_old for σ &lt;= τ', and Φ(σ − τ')·Γ(τ')·v_old + Γ(σ − τ')·v_new added to Φ(σ)·x
/// after, where Φ(σ) = e^{Aσ}, Γ(σ) = ∫₀^σ e^{Aρ}dρ·B (<see cref="HoldDiscretisation"/>; the full interval is the
/// modified z-transform's Γ₀, Γ₁ of <see cref="ZeroOrderHold"/>). The output rows C_y·Φ(jh) and gains C_y·Γ(jh),
/// h = T/P, come from one exponential over h by the recurrences C_y·Φ((j+1)h) = C_y·Φ(jh)·Φ(h) and
/// Γ((j+1)h) = Γ(jh) + Φ(jh)·Γ(h); the full interval from exponentials over T (and T − τ', τ'), as the
/// z-plane path forms it. The output at an offset where the input switches is the value just after.</para>
/// </summary>
internal sealed class IntersampleOffsets
{
    private IntersampleOffsets(int points, int order)
    {
        Points = points;
        OutputRows = new double[points][];
        OldGains = new double[points];
        NewGains = new double[points];
        HoldsOld = new bool[points];
        Phi = new double[order, order];
        GammaNew = new double[order];
        GammaOld = new double[order];
    }

    /// <summary>P, the offsets per interval (&gt;= 1); offset 0 is the sample instant.</summary>
    public int Points { get; }

    /// <summary>C_y·Φ(σⱼ) for each offset.</summary>
    public double[][] OutputRows { get; }

    /// <summary>The output's gain on v_old at each offset (state part only; feed-through is separate).</summary>
    public double[] OldGains { get; }

    /// <summary>The output's gain on v_new at each offset (state part only).</summary>
    public double[] NewGains { get; }

    /// <summary>True where the plant input at the offset is still v_old (σⱼ &lt; τ').</summary>
    public bool[] HoldsOld { get; }

    /// <summary>Φ(T): the state one interval on.</summary>
    public double[,] Phi { get; }

    /// <summary>The state's gain on v_new over a whole interval (Γ(T), or Γ(T − τ') with a remainder).</summary>
    public double[] GammaNew { get; }

    /// <summary>The state's gain on v_old over a whole interval (0, or Φ(T − τ')·Γ(τ') with a remainder).</summary>
    public double[] GammaOld { get; }

    /// <summary>The offsets of <paramref name="plant"/> held over <paramref name="sampleTime"/> (s, &gt; 0) with the delay remainder <paramref name="remainder"/> in [0, T).</summary>
    public static IntersampleOffsets Of(HeldPlantSystem plant, double sampleTime, double remainder, int points)
    {
        var system = plant.Series;
        var offsets = new IntersampleOffsets(points, system.Order);
        double h = sampleTime / points;
        if (system.Order == 0)
        {
            // A static plant: its output is its feed-through alone.
            for (int j = 0; j < points; j++)
            {
                offsets.OutputRows[j] = [];
                offsets.HoldsOld[j] = j * h < remainder;
            }

            return offsets;
        }

        offsets.FillInterval(system, sampleTime, remainder);
        var step = HoldDiscretisation.Of(system, h);
        var rows = new Vector<double>[points];
        var gains = new double[points];
        rows[0] = plant.PlantOutput.Clone();
        for (int j = 1; j < points; j++)
        {
            rows[j] = step.Phi.LeftMultiply(rows[j - 1]);
            gains[j] = gains[j - 1] + rows[j - 1].DotProduct(step.Gamma);
        }

        // First offset past the switch, and the rows from the switch on: C_y·Φ(σ − τ') with σ − τ' = (j − first)·h + δ.
        int first = remainder > 0.0 ? (int)Math.Floor(remainder / h) + 1 : 0;
        var late = remainder > 0.0 && first < points ? LateInputs(system, (first * h) - remainder, remainder) : ((Vector<double> Old, Vector<double> NewState)?)null;
        for (int j = 0; j < points; j++)
        {
            offsets.OutputRows[j] = rows[j].ToArray();
            offsets.HoldsOld[j] = j * h < remainder;
            if (remainder <= 0.0)
            {
                offsets.NewGains[j] = gains[j];
            }
            else if (j < first)
            {
                offsets.OldGains[j] = gains[j];
            }
            else
            {
                var row = rows[j - first];
                offsets.OldGains[j] = row.DotProduct(late!.Value.Old);
                offsets.NewGains[j] = row.DotProduct(late.Value.NewState) + gains[j - first];
            }
        }

        return offsets;
    }

    // Φ(δ)·Γ(τ') carries v_old's effect over the δ past the switch; Γ(δ) is v_new's over the same δ.
    private static (Vector<double> Old, Vector<double> NewState) LateInputs(StateSpace system, double delta, double remainder)
    {
        var past = HoldDiscretisation.Of(system, delta);
        var before = HoldDiscretisation.Of(system, remainder);
        return (past.Phi * before.Gamma, past.Gamma);
    }

    private void FillInterval(StateSpace system, double sampleTime, double remainder)
    {
        int n = system.Order;
        var whole = HoldDiscretisation.Of(system, sampleTime);
        var gammaNew = whole.Gamma;
        var gammaOld = Vector<double>.Build.Dense(n);
        if (remainder > 0.0)
        {
            var late = HoldDiscretisation.Of(system, sampleTime - remainder);
            gammaNew = late.Gamma;
            gammaOld = late.Phi * HoldDiscretisation.Of(system, remainder).Gamma;
        }

        for (int i = 0; i < n; i++)
        {
            GammaNew[i] = gammaNew[i];
            GammaOld[i] = gammaOld[i];
            for (int j = 0; j < n; j++)
            {
                Phi[i, j] = whole.Phi[i, j];
            }
        }
    }
}
