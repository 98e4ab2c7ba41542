using FlowCert.Certificates;
using FlowCert.Flows;
using FlowCert.Schedules;
using FlowCert.Simulation;

namespace FlowCert.Tests.Simulation;

/// <summary>Shared helpers: committed demo certificates, branch budgets, and schedule-based predicates.</summary>
public static class SimulationCases
{
    public static FlowResult Demo(string file)
        => CertificateReader.ReadFile(Path.Combine(FlowCert.Tests.Certificates.CorpusTests.RepositoryRoot(), "certificates", file));

    /// <summary>Every branch when there are at most 729, else 40 sampled ones plus the all-zero one.</summary>
    public static BranchSelection Budget(QuditPattern pattern, ulong seed)
        => Math.Pow(pattern.Dimension, pattern.Order.Count) <= 729 ? BranchSelection.All : BranchSelection.Sample(40, seed);

    /// <summary>Some measured node has a non-zero X-frame: its angle must be adapted.</summary>
    public static bool AdaptsSomeAngle(FeedForwardSchedule s) => s.Frames.Any(f => !f.IsOutput && !f.X.IsZero);

    /// <summary>Some measured node has a non-zero Z-frame: its outcome must be re-read.</summary>
    public static bool RereadsSomeOutcome(FeedForwardSchedule s) => s.Frames.Any(f => !f.IsOutput && !f.Z.IsZero);

    /// <summary>Some frame, of a measured node or an output, is non-zero.</summary>
    public static bool HasSomeFrame(FeedForwardSchedule s) => s.Frames.Any(f => !f.X.IsZero || !f.Z.IsZero);
}
