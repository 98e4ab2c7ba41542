namespace FlowCert.Tests.Oracles;

/// <summary>What a reference says about one graph, field and kind: whether a flow exists and its minimum depth.</summary>
public readonly record struct OracleAnswer(bool Exists, int Depth)
{
    public static readonly OracleAnswer None = new(false, -1);
    public override string ToString() => Exists ? $"flow of depth {Depth}" : "no flow";
}

/// <summary>The two flow kinds as the oracles name them (kept apart from the solver's enum on purpose).</summary>
public enum ReferenceKind { General, Causal }
