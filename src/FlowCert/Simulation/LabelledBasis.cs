using System.Numerics;
using FlowCert.Graphs;

namespace FlowCert.Simulation;

/// <summary>
/// The measurement basis of a qubit with a measurement label (flows.md section 9), and that basis seen
/// through the node's Pauli frame. Outcome 0 and 1 of a label are |psi_0&gt;, |psi_1&gt;:
/// XY: D^dagger Z^k |+&gt; (section 7); XZ: cos(t/2)|0&gt; + sin(t/2)|1&gt; and -sin(t/2)|0&gt; + cos(t/2)|1&gt;;
/// YZ: cos(t/2)|0&gt; + i sin(t/2)|1&gt; and i sin(t/2)|0&gt; + cos(t/2)|1&gt;; X: |+&gt;, |-&gt;;
/// Y: (|0&gt; + i|1&gt;)/sqrt 2, (|0&gt; - i|1&gt;)/sqrt 2; Z: |0&gt;, |1&gt;. The angle t is arg D_0 - arg D_1 of the
/// node's diagonal D, the same angle a as in the XY plane, where D = diag(1, e^(-i a)) (MeasurementAngles). With frame X^a Z^b (the state is X^a Z^b applied to the ideal one), the node
/// is measured in the basis X^a Z^b |psi_k&gt;: the frame is applied as an operator to the basis, so no table
/// of angle rules per label is needed, and outcome k is read as it is.
/// </summary>
public static class LabelledBasis
{
    /// <summary>|psi_k&gt; of a label for the node's diagonal D (k = 0 or 1).</summary>
    public static Complex[] Ket(MeasurementLabel label, IReadOnlyList<Complex> diagonal, int k)
    {
        double s2 = 1 / Math.Sqrt(2);
        double t = diagonal[0].Phase - diagonal[1].Phase;
        double c = Math.Cos(t / 2), s = Math.Sin(t / 2);
        int sign = k == 0 ? 1 : -1;
        return label switch
        {
            MeasurementLabel.XY => [Complex.Conjugate(diagonal[0]) * s2, Complex.Conjugate(diagonal[1]) * sign * s2],
            MeasurementLabel.XZ => k == 0 ? [c, s] : [-s, c],
            MeasurementLabel.YZ => k == 0 ? [c, new Complex(0, s)] : [new Complex(0, s), c],
            MeasurementLabel.X => [s2, sign * s2],
            MeasurementLabel.Y => [s2, new Complex(0, sign * s2)],
            MeasurementLabel.Z => k == 0 ? [1, 0] : [0, 1],
            _ => throw new ArgumentOutOfRangeException(nameof(label)),
        };
    }

    /// <summary>The bra &lt;psi_k| (X^a Z^b)^dagger: the coefficients the register projects onto.</summary>
    public static Complex[] FramedBra(MeasurementLabel label, IReadOnlyList<Complex> diagonal, int a, int b, int k)
    {
        var ket = Ket(label, diagonal, k);
        if (b % 2 != 0) ket[1] = -ket[1];              // Z^b
        if (a % 2 != 0) (ket[0], ket[1]) = (ket[1], ket[0]); // X^a
        return [Complex.Conjugate(ket[0]), Complex.Conjugate(ket[1])];
    }
}
