using static FlowCert.Tests.Cli.ScheduleCommandTests;

namespace FlowCert.Tests.Cli;

/// <summary>
/// simulate --map, --expect and --angles, and flowcert circuit, through the command line. The claim used
/// by the negative controls is the map the command itself wrote for the intended design (--map --out);
/// each control changes one thing (an angle, a correction, an edge weight) and --expect must exit 1.
/// </summary>
public sealed class MapCommandTests : IDisposable
{
    // A fictional Merrow Reach 2 x 3 qudit patch over F_5 with distinct weights (so a swap changes the graph state).
    private const string Patch = "input r0c0 r1c0\noutput r0c2 r1c2\nedge r0c0 r0c1 1\nedge r0c1 r0c2 2\nedge r1c0 r1c1 3\nedge r1c1 r1c2 1\nedge r0c1 r1c1 4\n";
    private const string Angles = "# Merrow Reach calibration (fictional)\nr0c0 0, pi/3, 1.25, -0.5, 2\nr0c1 0.1,0.2,0.3,0.4,0.5\nr1c0 pi, 0, 0, pi/2, 0\n";

    private readonly string dir = Directory.CreateTempSubdirectory("flowcert-map-").FullName;
    public void Dispose() => Directory.Delete(dir, true);

    private string Write(string name, string text) { var path = Path.Combine(dir, name); File.WriteAllText(path, text); return path; }

    private (string Graph, string Cert) Solve(string name, string graph, string flow = "causal", string field = "5")
    {
        var g = Write(name + ".ograph", graph);
        var cert = Path.Combine(dir, name + ".json");
        Assert.Equal(0, Run("solve", g, "--field", field, "--flow", flow, "--out", cert).Code);
        return (g, cert);
    }

    private string Claim(string graph, string cert, string angles)
    {
        var claim = Path.Combine(dir, "claim.json");
        var (code, o, e) = Run("simulate", graph, "--cert", cert, "--angles", angles, "--map", "--out", claim);
        Assert.True(code == 0, e);
        Assert.Contains("wrote        " + claim, o);
        return claim;
    }

    [Fact]
    public void TheWrittenMapIsAgreedWithAndEachNegativeControlIsCaught()
    {
        var (graph, cert) = Solve("patch", Patch);
        var angles = Write("angles.txt", Angles);
        var claim = Claim(graph, cert, angles);
        Assert.StartsWith("{\n  \"format\": \"flowcert-map\"", File.ReadAllText(claim));
        var ok = Run("simulate", graph, "--cert", cert, "--angles", angles, "--expect", claim);
        Assert.True(ok.Code == 0, ok.Out + ok.Err);
        Assert.Contains("agrees with all 625 branches", ok.Out);

        // 1. A wrong angle.
        var wrong = Write("wrong.txt", Angles.Replace("r0c1 0.1,0.2", "r0c1 0.1,0.25"));
        var (code, o, _) = Run("simulate", graph, "--cert", cert, "--angles", wrong, "--expect", claim);
        Assert.Equal(1, code);
        Assert.Contains("differs: largest difference", o);
        Assert.Contains("computed", o);

        // 2. A dropped correction: every branch is compared, so the outcome-dependent ones show.
        var text = File.ReadAllText(cert);
        var dropped = Write("dropped.json", System.Text.RegularExpressions.Regex.Replace(text, "\"r0c0\": \\{[^}]*\\}", "\"r0c0\": {}"));
        Assert.NotEqual(text, File.ReadAllText(dropped));
        (code, o, var e) = Run("simulate", graph, "--cert", dropped, "--angles", angles, "--expect", claim);
        Assert.Equal(1, code);
        Assert.Contains("differs", o);
        Assert.Contains("condition 2", e);

        // 3. Two edge weights swapped (3 and 2), certified afresh: a valid flow, another gate.
        var (swappedGraph, swappedCert) = Solve("swapped", Patch.Replace("r0c1 r0c2 2", "r0c1 r0c2 3").Replace("r1c0 r1c1 3", "r1c0 r1c1 2"));
        (code, o, _) = Run("simulate", swappedGraph, "--cert", swappedCert, "--angles", angles, "--expect", claim);
        Assert.Equal(1, code);
        Assert.Contains("differs", o);
    }

    [Fact]
    public void AClaimWithExactEntriesIsReadAndASmallMapIsPrinted()
    {
        var (graph, cert) = Solve("wire", "input a\noutput b\nedge a b\n", field: "2");
        var hadamard = Write("h.json", "[[\"1/sqrt(2)\", \"1/sqrt(2)\"], [\"1/sqrt(2)\", \"-1/sqrt(2)\"]]");
        var (code, o, _) = Run("simulate", graph, "--cert", cert, "--expect", hadamard);
        Assert.True(code == 0, o);
        var phased = Write("hp.json", "{\"matrix\": [[\"i/sqrt(2)\", \"i*exp(-i*pi/4)/sqrt(2)\"], [\"i/sqrt(2)\", \"-i*exp(-i pi/4)/sqrt(2)\"]]}");
        var angles = Write("a.txt", "a pi/4\n");
        Assert.Equal(0, Run("simulate", graph, "--cert", cert, "--angles", angles, "--expect", phased).Code);
        Assert.Equal(1, Run("simulate", graph, "--cert", cert, "--expect", phased).Code);
        (code, o, _) = Run("simulate", graph, "--cert", cert, "--map");
        Assert.Equal(0, code);
        Assert.Contains("map          2 x 2: rows outputs b, columns inputs a", o);
        Assert.Contains("|1>     0.707107  -0.707107", o);
    }

    [Theory]
    [InlineData("r9c9 1,2,3,4,5\n", ":1:1: unknown node 'r9c9'")]
    [InlineData("r0c2 1,2,3,4,5\n", ":1:1: node r0c2 is an output")]
    [InlineData("\nr0c0 1,2\n", ":2:6: a qudit of dimension 5 takes 5 diagonal phases")]
    [InlineData("r0c0 1,2,3,4,5x\n", ":1:15: value of 'r0c0': unknown name 'x'")]
    [InlineData("r0c0 1,2,3,4,i\n", ":1:14: value of 'r0c0': 'i' is not a real number")]
    [InlineData("r0c0 0,0,0,0,0\n  r0c0 0,0,0,0,0\n", ":2:3: node r0c0 has two angles (lines 1 and 2)")]
    public void ABadAnglesFileIsRefusedWithItsPlace(string text, string expected)
    {
        var (graph, cert) = Solve("patch", Patch);
        var angles = Write("bad.txt", text);
        var (code, o, e) = Run("simulate", graph, "--cert", cert, "--angles", angles, "--map");
        Assert.Equal(2, code);
        Assert.Equal("", o);
        Assert.Contains(angles + expected, e);
    }

    [Theory]
    [InlineData("[[1, 0], [0, 1]]", "the claim has 2 rows; the map has 25")]
    [InlineData("{\"rows\": []}", "an object with a \"matrix\" key")]
    public void AClaimOfTheWrongShapeIsRefused(string text, string expected)
    {
        var (graph, cert) = Solve("patch", Patch);
        var (code, _, e) = Run("simulate", graph, "--cert", cert, "--expect", Write("claim.json", text));
        Assert.Equal(2, code);
        Assert.Contains(expected, e);
    }

    [Fact]
    public void AMapTooLargeToPrintAsksForOut()
    {
        // 5^2 x 5^2 = 625 entries print; a 3 x 3 qutrit patch's 27 x 27 = 729 is still fine; 5^3 x 5^3 is not.
        var (graph, cert) = Solve("wide", "input a b c\noutput d e f\nedge a d\nedge b e\nedge c f\n");
        var (code, o, e) = Run("simulate", graph, "--cert", cert, "--map");
        Assert.Equal(2, code);
        Assert.Equal("", o);
        Assert.Contains("125 x 125 entries, too many to print: write it as JSON with --out FILE", e);
    }

    [Fact]
    public void TheCircuitCommandWritesEveryFormatAndRefusesWhatItCannot()
    {
        var (graph, cert) = Solve("patch", Patch);
        var angles = Write("angles.txt", Angles);
        var (code, text, _) = Run("circuit", cert, "--angles", angles);
        Assert.Equal(0, code);
        Assert.Contains("circuit of a causal flow: field F5, 2 wires", text);
        Assert.Equal(text, Run("circuit", cert, "--angles", angles).Out);
        (code, var json, _) = Run("circuit", cert, "--format", "json");
        Assert.Equal(0, code);
        Assert.Contains("\"format\": \"flowcert-circuit\"", json);
        var (qcode, _, qerr) = Run("circuit", cert, "--format", "qasm");
        Assert.Equal(2, qcode);
        Assert.Contains("OpenQASM describes qubits", qerr);

        // A generalized flow with a correction of two entries (a random certified graph) is refused in one sentence.
        var general = FlowCert.Tests.Simulation.RandomFlowCorpus.Certificates(2, 60, 4242)
            .First(x => x.Result.Kind == FlowCert.Flows.FlowKind.General && x.Result.Corrections.Values.Any(c => c.Count > 1)).Result;
        var generalCert = Write("general.json", FlowCert.Certificates.CertificateWriter.Write(general));
        var (gcode, gout, gerr) = Run("circuit", generalCert);
        Assert.Equal(2, gcode);
        Assert.Equal("", gout);
        Assert.Contains("the flow is not causal: the correction of", gerr);
        Assert.Single(gerr.Trim().Split('\n'));

        var (wgraph, wcert) = Solve("qubits", "input a\noutput c\nedge a b\nedge b c\n", field: "2");
        var qasm = Path.Combine(dir, "w.qasm");
        Assert.Equal(0, Run("circuit", wcert, "--format", "qasm", "--out", qasm).Code);
        Assert.StartsWith("OPENQASM 3.0;\ninclude \"stdgates.inc\";\n", File.ReadAllText(qasm));
    }
}
