namespace FlowCert.Graphs.Families;

/// <summary>
/// What to generate, as the user wrote it: the family's name, its size (<c>N</c>, <c>RxC</c> or
/// <c>XxYxZ</c>), and the options a family may take. <see cref="FamilyGenerator"/> checks that every
/// given option applies to the family.
/// </summary>
public sealed record FamilyRequest
{
    /// <summary>The family's name, one of <see cref="FamilyGenerator.Catalog"/>.</summary>
    public required string Family { get; init; }
    /// <summary><c>N</c> (line, random, regular), <c>RxC</c> (rows by columns) or <c>XxYxZ</c> (cubic).</summary>
    public required string Size { get; init; }
    /// <summary>Wrap the lattice across the direction from inputs to outputs.</summary>
    public bool Periodic { get; init; }
    /// <summary>Edge probability of <c>random</c>: a fraction or decimal from 0 to 1.</summary>
    public string? Probability { get; init; }
    /// <summary>Degree of <c>regular</c>.</summary>
    public int? Degree { get; init; }
    /// <summary>How many nodes of a random graph are inputs (the first ones).</summary>
    public int? InputCount { get; init; }
    /// <summary>How many nodes of a random graph are outputs (the last ones).</summary>
    public int? OutputCount { get; init; }
    /// <summary>Seed of the random structure and the random weights.</summary>
    public ulong Seed { get; init; }
    /// <summary>How edge weights are chosen (all 1 unless asked otherwise).</summary>
    public WeightRule Weights { get; init; } = WeightRule.Unit;
}

/// <summary>A family the generator knows: its name, the form of its size, and its lattice directions.</summary>
public sealed record FamilyInfo(string Name, string SizeForm, IReadOnlyList<string> Directions, bool CanBePeriodic, string Description);
