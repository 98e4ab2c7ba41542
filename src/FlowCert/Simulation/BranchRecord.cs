using MathNet.Numerics.LinearAlgebra;
using System.Numerics;

namespace FlowCert.Simulation;

/// <summary>
/// One simulated branch. Arrays are indexed by node; entries of nodes they do not concern are 0.
/// </summary>
/// <param name="Raw">The raw outcome of every measured node (what the detector shows).</param>
/// <param name="Outcome">The outcome m_v re-read through v's frame (raw - b_v), the one that drives corrections.</param>
/// <param name="FrameX">The X-frame a_w: when w was measured (measured nodes) or after the last round (outputs).</param>
/// <param name="FrameZ">The Z-frame b_w, likewise.</param>
/// <param name="OutputMap">The unnormalized map from input space to output space after the output corrections.</param>
public sealed record BranchRecord(int[] Raw, int[] Outcome, int[] FrameX, int[] FrameZ, Matrix<Complex> OutputMap);
