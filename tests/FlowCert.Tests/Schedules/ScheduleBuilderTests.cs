using FlowCert.Algebra;
using FlowCert.Certificates;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Schedules;
using Fractions;

namespace FlowCert.Tests.Schedules;

public class ScheduleBuilderTests
{
    private static FlowResult Solve(string ograph, FieldSpec field, FlowKind kind = FlowKind.General)
        => CertificateReader.Parse(CertificateWriter.Write(FlowSolver.Solve(OgraphReader.Parse(ograph, "t.ograph"), field, kind)), "t.json");

    private const string Wire3 = "input a\noutput c\nedge a b\nedge b c\n";

    [Fact]
    public void AThreeNodeQutritWireHasTheHandDerivedCorrectionsAndFrames()
    {
        // By hand from flows.md section 7 (common practice: the linear cluster wire). c_a = e_b, c_b = e_c;
        // A c_a = column b = e_a + e_c, A c_b = e_b. Outcome m_a leaves X_b^m_a Z_c^m_a, m_b leaves X_c^m_b.
        var s = ScheduleBuilder.Build(Solve(Wire3, FieldSpec.PrimeField(3)));
        var n = s.Graph.Names;
        var corrections = s.Corrections.Select(c => $"{n[c.Source]}>{n[c.Target]} {c.X} {c.Z}").ToArray();
        Assert.Equal(["a>b 2 0", "a>c 0 2", "b>c 2 0"], corrections); // -1 = 2 in F3
        var frames = s.Frames.Select(f => $"{n[f.Node]} {f.Round} {ScheduleText.Form(f.X, n)} | {ScheduleText.Form(f.Z, n)}").ToArray();
        Assert.Equal(["b 2 m_a | 0", "c 0 m_b | m_a"], frames);
        var st = s.Statistics;
        Assert.Equal(2, st.Depth);
        Assert.Equal([1, 1], st.NodesPerRound);
        Assert.Equal((2, 1, 3), (st.NonZeroX, st.NonZeroZ, st.NonZeroCorrections));
        Assert.Equal((1, 0, 2), (st.MaxAngleDependencies, st.MaxReadoutDependencies, st.MaxOutputDependencies));
        Assert.Equal(["a", "b", "c"], st.LongestChain.Select(v => n[v]));
    }

    [Theory]
    [InlineData(2)]
    [InlineData(5)]
    [InlineData(9)]
    public void TheLongestChainOfAWireRunsThroughEveryNode(int length)
    {
        // A wire's outcomes feed forward node to node (common practice): the chain is the whole wire.
        var names = Enumerable.Range(0, length).Select(i => $"n{i:D2}").ToArray();
        var text = $"input {names[0]}\noutput {names[^1]}\n" + string.Concat(names.Skip(1).Select((v, i) => $"edge {names[i]} {v}\n"));
        var s = ScheduleBuilder.Build(Solve(text, FieldSpec.PrimeField(5), FlowKind.Causal));
        Assert.Equal(names, s.Statistics.LongestChain.Select(v => s.Graph.Names[v]));
        Assert.Equal(length - 1, s.Statistics.Depth);
    }

    [Theory]
    [InlineData("loop-wire.Q.general.json")]
    [InlineData("loop-wire.Q.causal.json")]
    [InlineData("splitter-pair.Q.general.json")]
    [InlineData("qutrit-patch.Q.general.json")]
    public void OverQEveryExponentEqualsAnIndependentFractionsComputation(string file)
    {
        // Reference: the Fractions package, reading the certificate's weights and vectors itself.
        var path = Path.Combine(FlowCert.Tests.Certificates.CorpusTests.RepositoryRoot(), "certificates", file);
        var json = Newtonsoft.Json.Linq.JObject.Parse(File.ReadAllText(path));
        var weights = new Dictionary<(string, string), Fraction>();
        foreach (var e in json["graph"]!["edges"]!)
        {
            var w = Fraction.FromString((string)e[2]!, System.Globalization.CultureInfo.InvariantCulture);
            weights[((string)e[0]!, (string)e[1]!)] = w;
            weights[((string)e[1]!, (string)e[0]!)] = w;
        }
        var s = ScheduleBuilder.Build(CertificateReader.ReadFile(path));
        var n = s.Graph.Names;
        int checkedEntries = 0;
        foreach (var c in s.Corrections)
        {
            var vector = ((Newtonsoft.Json.Linq.JObject)json["corrections"]![n[c.Source]]!).Properties()
                .ToDictionary(p => p.Name, p => Fraction.FromString((string)p.Value!, System.Globalization.CultureInfo.InvariantCulture));
            var x = -vector.GetValueOrDefault(n[c.Target], Fraction.Zero);
            var z = -vector.Aggregate(Fraction.Zero, (sum, kv) => sum + weights.GetValueOrDefault((n[c.Target], kv.Key), Fraction.Zero) * kv.Value);
            Assert.Equal(x, Fraction.FromString(c.X.ToString(), System.Globalization.CultureInfo.InvariantCulture));
            Assert.Equal(z, Fraction.FromString(c.Z.ToString(), System.Globalization.CultureInfo.InvariantCulture));
            checkedEntries++;
        }
        Assert.True(checkedEntries > 0);
    }

    [Fact]
    public void ANoflowCertificateHasNoSchedule()
    {
        var e = Assert.Throws<ScheduleException>(() => ScheduleBuilder.Build(FlowCert.Tests.Simulation.SimulationCases.Demo("merge-attempt.Q.general.json")));
        Assert.Contains("no flow", e.Message);
    }

    [Fact]
    public void CorrectionsThatAreNotAFlowAreRefusedNamingTheNodeAndCondition()
    {
        var r = Solve(Wire3, FieldSpec.PrimeField(3));
        int a = r.Graph.IndexOf("a");
        var bad = r with { Corrections = r.Corrections.ToDictionary(kv => kv.Key, kv => kv.Key == a ? NodeVector.Create(r.Field, [r.Graph.IndexOf("b")], new ulong[] { 2 }) : kv.Value) };
        var e = Assert.Throws<ScheduleException>(() => ScheduleBuilder.Build(bad));
        Assert.Contains("correction of a", e.Message);
        Assert.Contains("condition 2", e.Message);
        var backwards = r with { Corrections = r.Corrections.ToDictionary(kv => kv.Key, kv => kv.Key == r.Graph.IndexOf("b") ? NodeVector.Create(r.Field, [a], new ulong[] { 1 }) : kv.Value) };
        Assert.Contains("condition 1", Assert.Throws<ScheduleException>(() => ScheduleBuilder.Build(backwards)).Message);
    }
}
