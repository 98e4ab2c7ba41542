using FlowCert.Schedules;
using Newtonsoft.Json.Linq;

namespace FlowCert.Tests.Schedules;

/// <summary>The CSV (RFC 4180) and JSON layouts of docs/schedule.md, read back by general-purpose parsers.</summary>
public class ScheduleFormatTests
{
    private static FeedForwardSchedule Patch() => ScheduleBuilder.Build(FlowCert.Tests.Simulation.SimulationCases.Demo("qutrit-patch.F3.general.json"));
    private static FeedForwardSchedule Splitter() => ScheduleBuilder.Build(FlowCert.Tests.Simulation.SimulationCases.Demo("splitter-pair.F3.general.json"));

    [Fact]
    public void EveryFormatListsTheEdgesThatVanishInTheField()
    {
        // The patch's rung r0c2-r1c2 has weight 3, which is 0 in F3 (flows.md section 1: report it, never silently).
        var s = Patch();
        Assert.Contains("\nwarning: 1 edge has weight 0 in F3 and vanishes: r0c2-r1c2 (3)\n", ScheduleText.Write(s));
        var rows = ScheduleCsv.Write(s).Split('\n').Select(l => l.Split(',')).ToList();
        Assert.Equal([["vanished", "r0c2", "", "r1c2", "3", ""]], rows.Where(r => r[0] == "vanished"));
        var json = JObject.Parse(ScheduleJson.Write(s));
        Assert.Equal("[[\"r0c2\",\"r1c2\",\"3\"]]", json["vanishedEdges"]!.ToString(Newtonsoft.Json.Formatting.None));

        // The splitter pair's weights are 1 and -1: nothing vanishes in F3, and nothing is said.
        var none = Splitter();
        Assert.DoesNotContain("warning", ScheduleText.Write(none));
        Assert.DoesNotContain("\nvanished,", ScheduleCsv.Write(none));
        Assert.Empty((JArray)JObject.Parse(ScheduleJson.Write(none))["vanishedEdges"]!);
    }

    [Fact]
    public void TheJsonCarriesEveryCorrectionAndFrameWithExactStrings()
    {
        var s = Patch();
        var text = ScheduleJson.Write(s);
        Assert.DoesNotContain("\r", text);
        Assert.Equal(text, ScheduleJson.Write(Patch()));
        var root = JObject.Parse(text);
        Assert.Equal(new[] { "format", "version", "flow", "field", "graphSha256", "vanishedEdges", "depth", "rounds", "outputs", "corrections", "frames", "statistics" },
            root.Properties().Select(p => p.Name));
        Assert.Equal("flowcert-schedule", (string)root["format"]!);
        Assert.Equal(s.Corrections.Count, ((JArray)root["corrections"]!).Count);
        foreach (var (c, j) in s.Corrections.Zip((JArray)root["corrections"]!))
            Assert.Equal((s.Graph.Names[c.Source], s.Graph.Names[c.Target], c.X.ToString(), c.Z.ToString()), ((string)j["outcome"]!, (string)j["node"]!, (string)j["x"]!, (string)j["z"]!));
        var frames = (JArray)root["frames"]!;
        Assert.Equal(s.Frames.Count, frames.Count);
        Assert.All(frames.Where(f => f["round"]!.Type == JTokenType.Null), f => Assert.Contains((string)f["node"]!, new[] { "r0c3", "r1c3" }));
        Assert.Equal(4, ((JArray)root["statistics"]!["longestChain"]!).Count);
    }

    [Fact]
    public void TheCsvHasOneHeaderAndARowPerRoundEntryCorrectionFrameTermAndStatistic()
    {
        var s = Patch();
        var lines = ScheduleCsv.Write(s).Split('\n');
        Assert.Equal("", lines[^1]); // ends with LF
        var rows = lines[..^1].Select(l => l.Split(',')).ToList();
        Assert.Equal(ScheduleCsv.Header, string.Join(",", rows[0]));
        Assert.All(rows, r => Assert.Equal(6, r.Length));
        Assert.Equal(6, rows.Count(r => r[0] == "measure"));
        Assert.Equal(2, rows.Count(r => r[0] == "output"));
        Assert.Equal(s.Corrections.Count, rows.Count(r => r[0] == "correction"));
        Assert.Equal(s.Frames.Sum(f => f.X.Terms.Select(t => t.Node).Union(f.Z.Terms.Select(t => t.Node)).Count()), rows.Count(r => r[0] == "frame"));
        Assert.Contains(rows, r => r is ["statistic", "depth", "", "", "3", ""]);
        // A frame row's coefficients are the negated correction's (F3: 1 <-> 2, 0 <-> 0).
        foreach (var f in rows.Where(r => r[0] == "frame"))
        {
            var c = rows.Single(r => r[0] == "correction" && r[1] == f[1] && r[3] == f[3]);
            Assert.Equal((3 - int.Parse(c[4])) % 3, int.Parse(f[4]));
            Assert.Equal((3 - int.Parse(c[5])) % 3, int.Parse(f[5]));
        }
    }
}
