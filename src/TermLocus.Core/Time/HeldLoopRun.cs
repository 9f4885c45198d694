namespace TermLocus.Core.Time;

/// <summary>
/// The sample-by-sample run of <see cref="HeldLoopResponse"/>: controller state ξ, plant·sensor state x and the held
/// controller outputs u_k, in plain arrays so the inner loops allocate nothing.
/// </summary>
internal sealed class HeldLoopRun
{
    private readonly StateSpace controller;
    private readonly HeldPlantSystem plant;
    private readonly IntersampleOffsets offsets;
    private readonly double sign;
    private readonly int wholeSamples;
    private readonly bool hasRemainder;
    private readonly double instantLoopGain;

    /// <param name="controller">C(z) as a discrete state space.</param>
    /// <param name="plant">Plant and sensor in series.</param>
    /// <param name="offsets">One interval, precomputed.</param>
    /// <param name="sign">+1 for positive feedback (e = r + y_s), −1 for negative.</param>
    /// <param name="wholeSamples">m, the whole sample intervals of delay.</param>
    /// <param name="hasRemainder">True when the delay has a remainder τ' &gt; 0.</param>
    /// <param name="instantLoopGain">1 ± D_c·D when the sample instant is an algebraic loop (no delay), else 1.</param>
    public HeldLoopRun(
        StateSpace controller, HeldPlantSystem plant, IntersampleOffsets offsets, double sign, int wholeSamples, bool hasRemainder, double instantLoopGain)
    {
        this.controller = controller;
        this.plant = plant;
        this.offsets = offsets;
        this.sign = sign;
        this.wholeSamples = wholeSamples;
        this.hasRemainder = hasRemainder;
        this.instantLoopGain = instantLoopGain;
    }

    /// <summary>The plant output at (samples − 1)·P + 1 points: P per interval, then the last instant.</summary>
    public double[] Outputs(int samples)
    {
        int points = offsets.Points;
        var y = new double[((samples - 1) * points) + 1];
        var u = new double[samples];
        var x = new double[plant.Series.Order];
        var xi = new double[controller.Order];
        var next = new double[Math.Max(x.Length, xi.Length)];
        var ac = controller.A.ToArray();
        var bc = controller.B.ToArray();
        var cc = controller.C.ToArray();
        var cs = plant.Series.C.ToArray();
        double sensorFeedthrough = plant.Series.D, feedthrough = plant.PlantFeedthrough;
        var (rows, oldGains, newGains, holdsOld) = (offsets.OutputRows, offsets.OldGains, offsets.NewGains, offsets.HoldsOld);
        bool instant = wholeSamples == 0 && !hasRemainder;
        for (int k = 0; k < samples; k++)
        {
            // The plant input at the instant: u_{k−m−1} with a remainder, u_{k−m} without (u_k itself: solved for).
            double vOld = Held(u, k - wholeSamples - 1);
            double atInstant = hasRemainder ? vOld : Held(u, k - wholeSamples);
            double fromState = Dot(cs, x);
            double free = Dot(cc, xi) + (controller.D * (1.0 + (sign * fromState)));
            u[k] = instant ? free / instantLoopGain : free + (controller.D * sign * sensorFeedthrough * atInstant);
            double sensed = fromState + (sensorFeedthrough * (instant ? u[k] : atInstant));
            Step(ac, bc, xi, 1.0 + (sign * sensed), next);
            double vNew = Held(u, k - wholeSamples);
            int last = k == samples - 1 ? 1 : points;
            for (int j = 0; j < last; j++)
            {
                double v = holdsOld[j] ? vOld : vNew;
                y[(k * points) + j] = Dot(rows[j], x) + (oldGains[j] * vOld) + (newGains[j] * vNew) + (feedthrough * v);
            }

            Propagate(x, vNew, vOld, next);
        }

        return y;
    }

    private static double Held(double[] u, int index) => index >= 0 ? u[index] : 0.0;

    // ξ ← A_c·ξ + B_c·e.
    private static void Step(double[,] a, double[] b, double[] state, double input, double[] scratch)
    {
        int n = state.Length;
        for (int i = 0; i < n; i++)
        {
            double acc = b[i] * input;
            for (int j = 0; j < n; j++)
            {
                acc += a[i, j] * state[j];
            }

            scratch[i] = acc;
        }

        Array.Copy(scratch, state, n);
    }

    // x ← Φ·x + Γ_new·v_new + Γ_old·v_old.
    private void Propagate(double[] x, double vNew, double vOld, double[] scratch)
    {
        int n = x.Length;
        for (int i = 0; i < n; i++)
        {
            double acc = (offsets.GammaNew[i] * vNew) + (offsets.GammaOld[i] * vOld);
            for (int j = 0; j < n; j++)
            {
                acc += offsets.Phi[i, j] * x[j];
            }

            scratch[i] = acc;
        }

        Array.Copy(scratch, x, n);
    }

    private static double Dot(double[] a, double[] b)
    {
        double sum = 0.0;
        for (int i = 0; i < a.Length; i++)
        {
            sum += a[i] * b[i];
        }

        return sum;
    }
}
