using static FlowCheck.Tests.Support;

namespace FlowCheck.Tests;

/// <summary>Every hand-written example is accepted, with the claim spelled out, and the oracle agrees.</summary>
public class ExamplesTests
{
    public static TheoryData<string> Names() => new(Examples.AllValid().Select(e => e.Name));

    [Theory]
    [MemberData(nameof(Names))]
    public void CheckerAndOracleAcceptEveryExample(string name)
    {
        var cert = Examples.AllValid().Single(e => e.Name == name).Cert;
        Assert.Null(Oracle.Reason(cert));
        var r = Check(cert);
        Assert.Equal(0, r.Code);
        Assert.StartsWith("valid: ", r.First);
    }

    [Fact]
    public void CanonicalFormHashMatchesCoreutils()
    {
        // The bytes "input a\noutput c\nedge a b 1\nedge b c 1\n" hashed by coreutils sha256sum (outside the project).
        const string sha256sum = "6385fa1ce88161c0e1ff09b07aa9c48026b2d280de7643792b4555d8cda0f795";
        Assert.Equal(sha256sum, Examples.WireCausal()["graphSha256"]!.ToString());
        Assert.Equal("input a\noutput c\nedge a b 1\nedge b c 1\n", Support.Canonical((Newtonsoft.Json.Linq.JObject)Examples.WireCausal()["graph"]!));
    }

    [Fact]
    public void ValidLinesStateWhatWasProven()
    {
        AssertValid(Examples.WireCausal(), "valid: causal flow over Q, depth 2");
        AssertValid(Examples.WireCausal("F5"), "valid: causal flow over F5, depth 2");
        AssertValid(Examples.SquareQ(), "valid: generalized flow over Q, depth 1");
        AssertValid(Examples.SquareF3(), "valid: generalized flow over F3, depth 1");
        AssertValid(Examples.GflowF2(), "valid: generalized flow over F2, depth 2");
        AssertValid(Examples.NothingMeasured(), "valid: generalized flow over Q, depth 0");
        AssertValid(Examples.SquareF2NoFlow(), "valid: no generalized flow over F2, blocked set of 2 nodes");
        AssertValid(Examples.GflowCausalNoFlow(), "valid: no causal flow over F2, blocked set of 3 nodes");
        AssertValid(Examples.FanGeneralNoFlow(), "valid: no generalized flow over Q, blocked set of 2 nodes");
    }

    [Fact]
    public void ValidOutputHasOnlyTheValidLineWhenNothingVanishes()
    {
        var r = Check(Examples.SquareQ());
        Assert.Equal(r.First + "\n", r.Out.ReplaceLineEndings("\n"));
    }
}
