using FlowCert.Graphs;
using FlowCert.Graphs.Formats;
using FlowCert.Noise;
using FlowCert.Simulation;

namespace FlowCert.Tests.Fuzz;

/// <summary>
/// The files of one NODE VALUE a line read beside a graph (labels, Gaussian phases, angles for qubits and
/// qutrits) on seeded mutations of valid files (<see cref="Mutator"/>): each outcome is a usable value or a
/// GraphFormatException with a line and column (GraphFileException for a file refused whole), never another
/// exception (common practice for readers of untrusted input).
/// </summary>
public class NodeValueFuzzTests
{
    public static TheoryData<string, int> Readers() => new() { { "labels", 1000 }, { "phases", 1000 }, { "angles2", 1000 }, { "angles3", 1000 } };

    // A valid file for the graph: every measured node but every third one, with a value that varies by line.
    private static string ValidFile(OpenGraph g, string reader)
    {
        string[] values = reader switch
        {
            "labels" => MeasurementLabels.All.Select(MeasurementLabels.Name).ToArray(),
            "phases" => ["1/2", "-3", "0.25", "7/9"],
            "angles2" => ["pi/4", "-3*pi/4", "0.5", "2pi/3"],
            _ => ["0, 2pi/3, -pi/3", "pi,0,0.25", "1e-3, sqrt(2), -1"],
        };
        var lines = new List<string> { "# a fictional calibration" };
        for (int v = 0; v < g.Names.Count; v++)
            if (!g.Outputs.Contains(v) && v % 3 != 2)
                lines.Add($"{g.Names[v]} {values[v % values.Length]}{(v % 4 == 0 ? "   # note" : "")}");
        return string.Join("\n", lines) + "\n";
    }

    // The value read, checked to be usable, as text; the reader's input error otherwise.
    private static string Read(OpenGraph g, string reader, string? text, string path)
    {
        switch (reader)
        {
            case "labels":
                return ReaderFuzzTests.Canonical(text is null ? LabelsFile.Apply(g, path) : LabelsFile.Apply(g, text, path));
            case "phases":
                var phases = text is null ? PhaseFile.Read(path, g) : PhaseFile.Parse(text, path, g);
                Assert.All(phases.Keys, v => Assert.DoesNotContain(v, g.Outputs));
                return string.Join(" ", phases.Select(kv => $"{kv.Key}:{kv.Value}"));
            default:
                int p = reader == "angles2" ? 2 : 3;
                var angles = text is null ? MeasurementAngles.Read(path, g, p) : MeasurementAngles.Parse(text, path, g, p);
                Assert.All(angles.Phases, kv => Assert.True(kv.Value.Length == p && kv.Value.All(double.IsFinite) && !g.Outputs.Contains(kv.Key)));
                return string.Join(" ", angles.Phases.Keys);
        }
    }

    [Theory]
    [MemberData(nameof(Readers))]
    public void MutatedFilesGiveAValueOrTheReadersInputError(string reader, int count)
    {
        var graphs = ReaderFuzzTests.SeedGraphs().ToArray();
        var seeds = graphs.Select(g => ValidFile(g, reader)).ToArray();
        // The seeds themselves are read without error, or the fuzzing starts from nothing.
        for (int s = 0; s < seeds.Length; s++) Assert.NotNull(Read(graphs[s], reader, seeds[s], "seed.txt"));
        var folder = Directory.CreateTempSubdirectory("flowcert-fuzz-").FullName;
        var mutator = new Mutator(reader.Length * 7919 + count);
        int results = 0, errors = 0;
        var failures = new List<string>();
        for (int t = 0; t < count; t++)
        {
            var input = mutator.Mutate(seeds[t % seeds.Length]);
            var graph = graphs[t % graphs.Length];
            try
            {
                // One input in ten goes through a file, as the commands read it, sometimes with a byte
                // that is not valid UTF-8.
                if (t % 10 == 0)
                {
                    var path = Path.Combine(folder, "fuzz.txt");
                    var data = new System.Text.UTF8Encoding(false).GetBytes(input);
                    if (data.Length > 0 && t % 20 == 0) data[(t * 7919) % data.Length] = 0xC3;
                    File.WriteAllBytes(path, data);
                    Assert.NotNull(Read(graph, reader, null, path));
                }
                else Assert.NotNull(Read(graph, reader, input, "fuzz.txt"));
                results++;
            }
            catch (GraphFormatException e) when (e.Line >= 1 && e.Column >= 1) { errors++; }
            catch (GraphFileException) { errors++; }
            catch (Exception e)
            {
                if (failures.Count < 3) failures.Add($"input #{t}: {e.GetType().Name}: {e.Message}\n{Excerpt.Of(input)}");
                else failures.Add("");
            }
        }
        Directory.Delete(folder, recursive: true);
        Assert.True(failures.Count == 0, $"{failures.Count} of {count} inputs ended in another exception:\n{string.Join("\n", failures.Take(3))}");
        // both outcomes occur, or the mutations did not exercise the reader
        Assert.True(errors > count / 10 && results > count / 10, $"{results} results, {errors} input errors");
    }
}
