using System.Diagnostics.CodeAnalysis;
using MathNet.Numerics.LinearAlgebra;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Time;

/// <summary>
/// Plant G(s) and sensor H(s) in series, driven by the held plant input v: one continuous state
/// x = [x_G; x_H] with x' = A·x + B·v. <see cref="Series"/>'s C and D give the sensor output
/// y_s = C·x + D·v (what is sampled); <see cref="PlantOutput"/> and <see cref="PlantFeedthrough"/> give the
/// plant output y = C_y·x + D_y·v (what a rig shows between samples). With G = (A_G, B_G, C_G, D_G) and
/// H = (A_H, B_H, C_H, D_H): A = [[A_G, 0], [B_H·C_G, A_H]], B = [B_G; B_H·D_G], C = [D_H·C_G, C_H],
/// D = D_H·D_G, C_y = [C_G, 0], D_y = D_G (series connection; common practice).
/// </summary>
/// <param name="Series">The series system, sensor output.</param>
/// <param name="PlantOutput">C_y, length <c>Series.Order</c>.</param>
/// <param name="PlantFeedthrough">D_y.</param>
internal sealed record HeldPlantSystem(StateSpace Series, Vector<double> PlantOutput, double PlantFeedthrough)
{
    /// <summary>
    /// The series system of the proper <paramref name="plant"/> and <paramref name="sensor"/> (rational in s);
    /// false with a one-line reason when either is improper or has a non-finite coefficient.
    /// </summary>
    public static bool TryOf(
        RationalFunction plant,
        RationalFunction sensor,
        [NotNullWhen(true)] out HeldPlantSystem? system,
        [NotNullWhen(false)] out string? error)
    {
        system = null;
        if (!StateSpace.TryFromTransferFunction(plant, out var g, out error))
        {
            error = "the plant on its own has no state-space form: " + error;
            return false;
        }

        if (!StateSpace.TryFromTransferFunction(sensor, out var h, out error))
        {
            error = "the sensor on its own has no state-space form: " + error;
            return false;
        }

        int ng = g.Order, n = ng + h.Order;
        var a = Matrix<double>.Build.Dense(n, n);
        var b = Vector<double>.Build.Dense(n);
        var c = Vector<double>.Build.Dense(n);
        var cy = Vector<double>.Build.Dense(n);
        a.SetSubMatrix(0, 0, g.A);
        a.SetSubMatrix(ng, ng, h.A);
        for (int i = 0; i < h.Order; i++)
        {
            for (int j = 0; j < ng; j++)
            {
                a[ng + i, j] = h.B[i] * g.C[j];
            }

            b[ng + i] = h.B[i] * g.D;
            c[ng + i] = h.C[i];
        }

        for (int j = 0; j < ng; j++)
        {
            b[j] = g.B[j];
            c[j] = h.D * g.C[j];
            cy[j] = g.C[j];
        }

        system = new HeldPlantSystem(new StateSpace(a, b, c, h.D * g.D), cy, g.D);
        return true;
    }
}
