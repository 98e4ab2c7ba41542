namespace FlowCert.Simulation;

/// <summary>
/// Deliberately wrong frame conventions, for tests that show each sign of flows.md section 7 is load-bearing.
/// </summary>
[Flags]
internal enum FrameFault
{
    None = 0,
    /// <summary>Frames accumulate -m c_v and -m A c_v (the corrections applied with the opposite sign).</summary>
    FlipCorrectionSign = 1,
    /// <summary>Measure with D itself, ignoring the X-frame.</summary>
    SkipAngleAdaptation = 2,
    /// <summary>Use X^-a D X^a in place of X^a D X^-a.</summary>
    FlipAngleAdaptation = 4,
    /// <summary>Read the outcome as raw + b in place of raw - b.</summary>
    FlipReadout = 8,
}
