namespace FlowCert.Tests.Cli;

/// <summary>Small graphs for the command-line tests (fictional Merrow Reach designs), with hand-derived facts.</summary>
public static class Designs
{
    /// <summary>
    /// A wire a - b - c - d with a parked output mode. Every flow has depth 3: c_b must touch c (a is an
    /// input), so c is later than b, and c_a must touch b, so b is later than a (flows.md section 3).
    /// Over F_2 the weight 2 vanishes; over F_3 the weight -1/3 has no value.
    /// </summary>
    public const string Wire =
        "# Merrow Reach (fictional): four-mode wire with a parked readout mode\n" +
        "input a\n" +
        "output d spare\n" +
        "edge a b\n" +
        "edge b c 2\n" +
        "edge c d -1/3\n" +
        "node spare\n";

    /// <summary>The canonical form of <see cref="Wire"/>, written by hand from docs/formats.md.</summary>
    public const string WireCanonical = "input a\noutput d spare\nnode spare\nedge a b 1\nedge b c 2\nedge c d -1/3\n";

    /// <summary>
    /// Two inputs merged into one output: no flow of either kind. U = {in1, in2} is blocked: its only
    /// correctors C = {mid, out} give A[U, C] = [[1, 0], [1, 0]], whose left kernel (1, -1) covers U
    /// (flows.md section 6).
    /// </summary>
    public const string Merge =
        "# Merrow Reach (fictional): two inputs into one output mode\n" +
        "input in1 in2\n" +
        "output out\n" +
        "edge in1 mid\n" +
        "edge in2 mid\n" +
        "edge mid out\n";

    public const string MergeCanonical = "input in1 in2\noutput out\nedge in1 mid 1\nedge in2 mid 1\nedge mid out 1\n";

    /// <summary>A file with an error at line 3, column 10 (a zero weight).</summary>
    public const string Broken = "input a\noutput b\nedge a b 0/5\n";
}
