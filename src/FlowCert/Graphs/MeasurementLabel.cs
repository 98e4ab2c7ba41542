namespace FlowCert.Graphs;

/// <summary>
/// How a measured qubit is measured (flows.md section 9): in a plane of the Bloch sphere at an arbitrary
/// angle (XY, XZ, YZ) or along a Pauli axis (X, Y, Z). A node without a label is XY.
/// </summary>
public enum MeasurementLabel
{
    /// <summary>The XY plane (the default; sections 3 to 6 of flows.md).</summary>
    XY,
    /// <summary>The XZ plane.</summary>
    XZ,
    /// <summary>The YZ plane.</summary>
    YZ,
    /// <summary>The Pauli X axis.</summary>
    X,
    /// <summary>The Pauli Y axis.</summary>
    Y,
    /// <summary>The Pauli Z axis.</summary>
    Z,
}

/// <summary>The one place where measurement labels are named and classified.</summary>
public static class MeasurementLabels
{
    /// <summary>Every label, in the order of the enumeration.</summary>
    public static readonly MeasurementLabel[] All =
        [MeasurementLabel.XY, MeasurementLabel.XZ, MeasurementLabel.YZ, MeasurementLabel.X, MeasurementLabel.Y, MeasurementLabel.Z];

    /// <summary>The name in files: <c>XY</c>, <c>XZ</c>, <c>YZ</c>, <c>X</c>, <c>Y</c> or <c>Z</c>.</summary>
    public static string Name(MeasurementLabel label) => label switch
    {
        MeasurementLabel.XY => "XY",
        MeasurementLabel.XZ => "XZ",
        MeasurementLabel.YZ => "YZ",
        MeasurementLabel.X => "X",
        MeasurementLabel.Y => "Y",
        MeasurementLabel.Z => "Z",
        _ => throw new ArgumentOutOfRangeException(nameof(label)),
    };

    /// <summary>Reads a name written by <see cref="Name"/> (exact case); false for anything else.</summary>
    public static bool TryParse(ReadOnlySpan<char> text, out MeasurementLabel label)
    {
        foreach (var l in All)
            if (text.SequenceEqual(Name(l))) { label = l; return true; }
        label = MeasurementLabel.XY;
        return false;
    }

    /// <summary>True for the planes XY, XZ, YZ (measured at an angle); false for the Pauli axes.</summary>
    public static bool IsPlane(MeasurementLabel label) => label is MeasurementLabel.XY or MeasurementLabel.XZ or MeasurementLabel.YZ;

    /// <summary>The text listing the labels, for messages.</summary>
    public const string Choices = "XY, XZ, YZ, X, Y or Z";
}
