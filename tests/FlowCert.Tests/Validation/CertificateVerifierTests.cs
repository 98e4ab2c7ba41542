using FlowCert.Algebra;
using FlowCert.Certificates;
using FlowCert.Flows;
using FlowCert.Graphs;
using Newtonsoft.Json;
using Newtonsoft.Json.Linq;

namespace FlowCert.Tests.Validation;

/// <summary>
/// The verifier must not be a rubber stamp: genuine certificates pass, and each broken copy is rejected
/// for the reason that breaks flows.md sections 3, 4 or 6 (or the format of docs/formats.md).
/// </summary>
public sealed class CertificateVerifierTests
{
    private const string Wire = "input a\noutput d\nedge a b 1\nedge b c -1/2\nedge c d 3\n";
    private const string Merge = "input i1 i2\noutput o\nedge i1 m 1\nedge i2 m 1\nedge m o 1\n";

    private static JObject Certificate(string graph, string field, FlowKind kind)
    {
        var result = FlowSolver.Solve(OgraphReader.Parse(graph, "t.ograph"), FieldSpec.Parse(field), kind);
        var json = CertificateWriter.Write(result);
        CertificateVerifier.Verify(json); // the genuine one passes
        return JObject.Parse(json);
    }

    private static void Rejected(JObject broken, string reasonFragment)
    {
        var e = Assert.Throws<CertificateRejectedException>(() => CertificateVerifier.Verify(broken.ToString(Formatting.Indented)));
        Assert.Contains(reasonFragment, e.Message);
    }

    [Fact]
    public void WrongCorrectionValueIsRejected()
    {
        var c = Certificate(Wire, "Q", FlowKind.General);
        c["corrections"]!["a"]!["b"] = "2";
        Rejected(c, "not 1");
    }

    [Fact]
    public void CorrectionOnAnEarlierNodeIsRejected()
    {
        var c = Certificate(Wire, "F5", FlowKind.General);
        var rounds = (JArray)c["rounds"]!;
        var first = rounds[0];
        rounds[0] = rounds[2]; rounds[2] = first; // measure c first and a last
        Rejected(c, "not later");
    }

    [Fact]
    public void DepthThatDoesNotMatchTheRoundsIsRejected()
    {
        var c = Certificate(Wire, "Q", FlowKind.Causal);
        c["depth"] = 2;
        Rejected(c, "rounds");
    }

    [Fact]
    public void CausalCorrectionWithTwoEntriesIsRejected()
    {
        var c = Certificate("input a\noutput x y\nedge a x\nedge a y\n", "Q", FlowKind.Causal);
        var ca = (JObject)c["corrections"]!["a"]!;
        ca["x"] = "1"; ca["y"] = "1";
        // (A c_a)(a) = 2, so section 3 fails first; the causal shape is checked as well
        Rejected(c, "c_a");
    }

    [Fact]
    public void WitnessOutsideTheLeftKernelIsRejected()
    {
        var c = Certificate(Merge, "Q", FlowKind.General);
        var w = (JObject)((JArray)c["obstruction"]!["witnesses"]!)[0];
        var key = w.Properties().First().Name;
        w[key] = "7";
        Rejected(c, "left kernel");
    }

    [Fact]
    public void WitnessesThatDoNotCoverTheBlockedSetAreRejected()
    {
        var c = Certificate(Merge, "F3", FlowKind.General);
        ((JArray)c["obstruction"]!["witnesses"]!).Clear();
        Rejected(c, "cover");
    }

    [Fact]
    public void CausalBlockedSetWithAOneNeighbourCorrectorIsRejected()
    {
        var c = Certificate(Merge, "Q", FlowKind.Causal);
        c["obstruction"]!["blocked"] = new JArray("i1", "i2"); // m is then a corrector... with two blocked neighbours
        CertificateVerifier.Verify(c.ToString()); // still a valid proof: m has 2, o has 0
        c["obstruction"]!["blocked"] = new JArray("i1", "i2", "m"); // o has exactly one neighbour (m) in U
        Rejected(c, "exactly one neighbour");
    }

    [Fact]
    public void GraphHashAndFieldAreChecked()
    {
        var c = Certificate(Wire, "Q", FlowKind.General);
        c["graph"]!["edges"]![0]![2] = "2";
        Rejected(c, "graphSha256");
        var d = Certificate(Wire, "Q", FlowKind.General);
        d["field"] = "F4";
        Rejected(d, "not prime");
    }
}
