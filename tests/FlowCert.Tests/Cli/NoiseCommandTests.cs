using System.Globalization;
using FlowCert.Algebra;
using FlowCert.Certificates;
using FlowCert.Noise;
using Newtonsoft.Json.Linq;

namespace FlowCert.Tests.Cli;

/// <summary>`flowcert noise CERT`: exit codes, refusals with their reasons, phases files, the figures.</summary>
public class NoiseCommandTests
{
    private static (int Code, string Out, string Err) Run(params string[] args) => ScheduleCommandTests.Run(args);
    private static string Corpus(string file) => ScheduleCommandTests.Corpus(file);

    // The loop wire's weights 1, -1/2, 3/4, 2: chaining the single teleportation step through weight g,
    // q -> -p/g and p -> g q + delta ("Quantum computing with continuous-variable clusters", arXiv:0903.3233),
    // by hand gives t4 q = -3/4 q_t0 - 3/4 d_t1 - 1/2 d_t3 and t4 p = -4/3 p_t0 - 8/3 d_t2 + d_t4 (docs/noise.md).
    [Theory]
    [InlineData("loop-wire.Q.causal.json")]
    [InlineData("loop-wire.Q.general.json")]
    public void TheLoopWireNoiseIsPrintedPerOutputQuadrature(string cert)
    {
        var (code, o, e) = Run("noise", Corpus(cert));
        Assert.True(code == 0, e);
        Assert.Contains("t4 q: 13/16 e^(-2r)/2", o);
        Assert.Contains("t4 p: 73/9 e^(-2r)/2", o);
        Assert.Contains("t4 q = -3/4 q_t0", o);
    }

    [Fact]
    public void ACertificateOverAnotherFieldIsRefusedInOneSentence()
    {
        var (code, o, e) = Run("noise", Corpus("loop-wire.F3.general.json"));
        Assert.Equal(2, code);
        Assert.Equal("", o);
        Assert.Contains("finite squeezing is a continuous-variable notion", e);
        Assert.Single(e.TrimEnd().Split('\n'));
    }

    [Fact]
    public void AProofOfAbsenceIsRefused()
    {
        var (code, o, e) = Run("noise", Corpus("merge-attempt.Q.general.json"));
        Assert.Equal(2, code);
        Assert.Equal("", o);
        Assert.Contains("no flow exists", e);
    }

    [Fact]
    public void ACorruptedCorrectionExitsOneNamingTheNode()
    {
        using var w = new Workspace();
        var text = File.ReadAllText(Corpus("loop-wire.Q.general.json"));
        Assert.Contains("\"t2\": {\"t3\": \"4/3\"}", text);
        var bad = w.Write("bad.json", text.Replace("\"t2\": {\"t3\": \"4/3\"}", "\"t2\": {\"t3\": \"5/3\"}"));
        var (code, o, _) = Run("noise", bad, "--sweep", "0:12:6");
        Assert.Equal(1, code);
        Assert.Contains("invalid: the anti-squeezed quadrature q of t3 reaches t4", o);
        // The negative control's growth: the anti-squeezed term makes the added variance rise with squeezing.
        var report = NoiseAnalysis.Analyze(CertificateReader.ReadFile(bad));
        var row = report.Leaks[0].Row;
        Assert.True(NoiseFigures.AddedVariance(report, row, 2) > NoiseFigures.AddedVariance(report, row, 1));
    }

    [Theory]
    [InlineData("t1 1/2\nt4 3\n", ":2:1:", "t4 is an output")]
    [InlineData("t1 1/2\n  zz 3\n", ":2:3:", "unknown node 'zz'")]
    [InlineData("t1 x\n", ":1:4:", "'x' is not an exact rational")]
    [InlineData("t1 1 2\n", ":1:6:", "a line of a phases file is NODE t")]
    [InlineData("t1 1\n# again\nt1 2\n", ":3:1:", "node t1 has two phases (lines 1 and 3)")]
    public void APhasesFileErrorNamesFileLineAndColumn(string phases, string where, string problem)
    {
        using var w = new Workspace();
        var path = w.Write("phases.txt", phases);
        var (code, o, e) = Run("noise", Corpus("loop-wire.Q.general.json"), "--phases", path);
        Assert.Equal(2, code);
        Assert.Equal("", o);
        Assert.Contains("phases.txt" + where, e);
        Assert.Contains(problem, e);
    }

    [Fact]
    public void PhasesChangeTheIdealMapAndAreEchoed()
    {
        using var w = new Workspace();
        var path = w.Write("phases.txt", "# Gaussian phases\nt0 1\n");
        var (code, o, _) = Run("noise", Corpus("loop-wire.Q.general.json"), "--phases", path);
        Assert.Equal(0, code);
        Assert.Contains("phases: t0 1; 0 elsewhere", o);
        // A phase on t0 turns its measured p into p + q: the output p picks up q_t0.
        Assert.Contains("t4 p = -4/3 q_t0 - 4/3 p_t0", o);
    }

    [Fact]
    public void DbAndSweepTogetherAreAUsageError()
    {
        var (code, _, e) = Run("noise", Corpus("loop-wire.Q.general.json"), "--db", "10", "--sweep", "0:10:5");
        Assert.Equal(2, code);
        Assert.Contains("not both", e);
    }

    [Fact]
    public void TheSweepHasOneRowPerLevel()
    {
        var (code, o, _) = Run("noise", Corpus("loop-wire.Q.general.json"), "--sweep", "0:15:3");
        Assert.Equal(0, code);
        var table = o[o.IndexOf("sweep (")..].Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(1 + 1 + 6, table.Length); // title, header, 0 3 6 9 12 15
    }

    [Fact]
    public void TheTargetIsTheLeastSufficientSqueezing()
    {
        var (code, o, _) = Run("noise", Corpus("loop-wire.Q.general.json"), "--target", "1/10", "--json");
        Assert.Equal(0, code);
        var need = (double)JObject.Parse(o)["target"]!["dB"]!;
        var report = NoiseAnalysis.Analyze(CertificateReader.ReadFile(Corpus("loop-wire.Q.general.json")));
        double Worst(double db) => Enumerable.Range(0, report.Rows).Max(row => NoiseFigures.AddedVariance(report, row, NoiseFigures.SqueezingParameter(db)));
        Assert.True(Worst(need) <= 0.1 + 1e-9);
        Assert.True(Worst(need - 0.01) > 0.1);
    }

    [Fact]
    public void TheJsonHasExactMatricesAndIsDeterministic()
    {
        var first = Run("noise", Corpus("qutrit-patch.Q.general.json"), "--json", "--db", "10");
        var second = Run("noise", Corpus("qutrit-patch.Q.general.json"), "--json", "--db", "10");
        Assert.Equal(0, first.Code);
        Assert.Equal(first.Out, second.Out);
        var json = JObject.Parse(first.Out);
        Assert.True((bool)json["valid"]!);
        var covariance = (JArray)json["covariance"]!;
        var l = ((JArray)json["L"]!).Select(row => row.Select(x => Parse((string)x!)).ToArray()).ToArray();
        // covariance = L L^T, entry by entry, in exact rationals read back from the strings.
        for (int i = 0; i < l.Length; i++)
            for (int j = 0; j < l.Length; j++)
            {
                var sum = Rational.Zero;
                for (int k = 0; k < l[i].Length; k++) sum += l[i][k] * l[j][k];
                Assert.Equal(sum, Parse((string)covariance[i][j]!));
            }
        Assert.Equal(NoiseFigures.SqueezingParameter(10), (double)json["at"]!["r"]!, 9);
    }

    // More outputs than inputs (docs/noise.md): the README's fan-out example, generated, solved twice and analysed.
    private static (string General, string Causal) FanOut(Workspace w)
    {
        var graph = w.PathOf("fan-out.ograph");
        Assert.Equal(0, Run("generate", "random", "--size", "7", "--probability", "1/3", "--input-count", "1", "--output-count", "3", "--seed", "8", "--out", graph).Code);
        Assert.Equal(0, Run("solve", graph, "--out", w.PathOf("fan-out.Q.general.json")).Code);
        Assert.Equal(0, Run("solve", graph, "--flow", "causal", "--out", w.PathOf("fan-out.Q.causal.json")).Code);
        return (w.PathOf("fan-out.Q.general.json"), w.PathOf("fan-out.Q.causal.json"));
    }

    [Fact]
    public void MoreOutputsThanInputsReportTheFiniteDirections()
    {
        using var w = new Workspace();
        var (general, causal) = FanOut(w);
        var (code, o, e) = Run("noise", general, "--db", "10", "--target", "1/2");
        Assert.True(code == 0, e);
        Assert.Contains("generalized flow over Q, depth 2", o);
        Assert.Contains("4 finite directions (2 logical, 2 nullifiers) and 2 anti-squeezed", o);
        Assert.Contains("f2 = -q_v5 - q_v6: logical, ideal value p_v0; 0 e^(-2r)/2", o);
        Assert.Contains("f4 = p_v4 + 2 q_v5 + p_v5 - p_v6: nullifier, ideal value 0; 9 e^(-2r)/2", o);
        Assert.Contains("f4: added variance 0.9 vacuum units", o);
        Assert.Contains("fidelity for coherent-state inputs: not defined with more outputs than inputs", o);
        // The worst direction has 9 e^(-2r)/2 = 9 e^(-2r) vacuum units / 2... i.e. 9 e^(-2r) <= 1/2: 10 log10(18) dB.
        Assert.Contains($"needs at least {(10 * Math.Log10(18)).ToString("0.00", CultureInfo.InvariantCulture)} dB", o);
        // The causal certificate has depth 4 and other anti-squeezed parts, and the same finite directions.
        var other = Run("noise", causal, "--db", "10");
        Assert.Equal(0, other.Code);
        Assert.Contains("causal flow over Q, depth 4", other.Out);
        string Finite(string text) => text[text.IndexOf("finite directions f")..text.IndexOf("anti-squeezed parts")];
        string AntiSqueezed(string text) => text[text.IndexOf("anti-squeezed parts")..text.IndexOf("at 10 dB")];
        Assert.Equal(Finite(o), Finite(other.Out));
        Assert.NotEqual(AntiSqueezed(o), AntiSqueezed(other.Out));
    }

    [Fact]
    public void MoreOutputsThanInputsHaveTheFiniteDirectionsInJson()
    {
        using var w = new Workspace();
        var (general, _) = FanOut(w);
        var (code, o, _) = Run("noise", general, "--json", "--sweep", "0:10:5");
        Assert.Equal(0, code);
        var json = JObject.Parse(o);
        var finite = (JObject)json["finite"]!;
        Assert.Equal(["directions", "kinds", "D", "DS", "DL", "covariance", "addedVariance", "DK"], finite.Properties().Select(p => p.Name));
        Assert.Equal(["logical", "logical", "nullifier", "nullifier"], finite["kinds"]!.Select(k => (string)k!));
        var d = Matrix(finite["D"]!);
        var dl = Matrix(finite["DL"]!);
        var l = Matrix(json["L"]!);
        // DL = D L and DK = 0, in exact rationals read back from the strings.
        for (int i = 0; i < d.Length; i++)
            for (int j = 0; j < l[0].Length; j++)
            {
                var sum = Rational.Zero;
                for (int k = 0; k < l.Length; k++) sum += d[i][k] * l[k][j];
                Assert.Equal(sum, dl[i][j]);
            }
        Assert.All(Matrix(finite["DK"]!).SelectMany(x => x), x => Assert.True(x.IsZero));
        var levels = (JArray)json["sweep"]!;
        Assert.Equal(3, levels.Count);
        Assert.All(levels, level => Assert.Equal(JTokenType.Null, level["fidelity"]!.Type));
        Assert.Equal(["f1", "f2", "f3", "f4"], ((JObject)levels[0]["addedVarianceVacuumUnits"]!).Properties().Select(p => p.Name));
    }

    // The negative control with more outputs than inputs: a corrupted correction exits 1 and names the node.
    [Fact]
    public void MoreOutputsThanInputsWithACorruptedCorrectionExitOne()
    {
        using var w = new Workspace();
        var (general, _) = FanOut(w);
        var flow = CertificateReader.ReadFile(general);
        var corrupted = FlowCert.Tests.Noise.NegativeControlTests.Corrupt(flow)!;
        Assert.False(FlowCert.Tests.Noise.EmbeddingTests.IsGeneralizedFlow(corrupted));
        var bad = w.Write("bad.json", CertificateWriter.Write(corrupted));
        var (code, o, _) = Run("noise", bad, "--target", "1");
        Assert.Equal(1, code);
        Assert.Matches(@"invalid: the anti-squeezed quadrature q of v\d reaches f\d = .*, a direction the measurements leave finite", o);
        Assert.Contains("target: no squeezing level meets 1 vacuum units", o);
        var json = JObject.Parse(Run("noise", bad, "--json").Out);
        Assert.False((bool)json["valid"]!);
        Assert.StartsWith("f", (string)json["leaks"]![0]!["direction"]!);
    }

    private static Rational[][] Matrix(JToken m) => m.Select(row => row.Select(x => Parse((string)x!)).ToArray()).ToArray();

    private static Rational Parse(string text) => Rational.TryParse(text, out var r) ? r : throw new FormatException(text);
}
