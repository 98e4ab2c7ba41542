using FlowCert.Certificates;
using FlowCert.Demo;
using FlowCert.Graphs;
using FlowCert.Graphs.Families;
using FlowCert.Graphs.Formats;
using FlowCert.Tests.Certificates;

namespace FlowCert.Tests.Fuzz;

/// <summary>
/// Every reader of the library on seeded mutations of valid files (<see cref="Mutator"/>): each outcome is
/// a graph (or certificate) that can be written again, or the reader's documented input error
/// (GraphFormatException with a line and column, GraphFileException, CertificateFormatException; the
/// CLI's exit 2), never another exception (common practice for readers of untrusted input).
/// 10,500 inputs here (4,000 more of the NODE VALUE files in NodeValueFuzzTests), 1,000 more through flowcheck in FlowCheck.Tests.
/// </summary>
public class ReaderFuzzTests
{
    internal static IEnumerable<OpenGraph> SeedGraphs()
    {
        foreach (var d in DemoScenario.Designs()) yield return d.Graph;
        yield return FamilyGenerator.Generate(new() { Family = "random", Size = "20", Probability = "1/5", InputCount = 2, OutputCount = 3, Seed = 5 });
        yield return FamilyGenerator.Generate(new() { Family = "square", Size = "3x4" });
    }

    private static bool UnitWeights(OpenGraph g) => g.Edges.All(e => e.Weight == FlowCert.Algebra.Rational.One);

    public static TheoryData<string, int> Readers() => new()
    {
        { "ograph", 2500 }, { "graph6", 1500 }, { "sparse6", 1500 }, { "mtx", 1500 }, { "json", 1500 }, { "certificate", 2000 },
    };

    [Theory]
    [MemberData(nameof(Readers))]
    public void MutatedInputsGiveAResultOrTheReadersInputError(string reader, int count)
    {
        var (seeds, format) = reader switch
        {
            "ograph" => (SeedGraphs().Select(OgraphWriter.Write).ToArray(), GraphFileFormat.Ograph),
            "graph6" => (SeedGraphs().Where(UnitWeights).Select(Graph6.Write).ToArray(), GraphFileFormat.Graph6),
            "sparse6" => (SeedGraphs().Where(UnitWeights).Select(Sparse6.Write).ToArray(), GraphFileFormat.Sparse6),
            "mtx" => (SeedGraphs().Select(MatrixMarketWriter.Write).ToArray(), GraphFileFormat.MatrixMarket),
            "json" => (SeedGraphs().Select(GraphJson.Write).ToArray(), GraphFileFormat.Json),
            _ => (Directory.GetFiles(Path.Combine(CorpusTests.RepositoryRoot(), "certificates"), "*.json").Order(StringComparer.Ordinal).Select(File.ReadAllText).ToArray(),
                  (GraphFileFormat?)null),
        };
        var extension = format is { } f ? Extension(f) : ".json";
        var folder = Directory.CreateTempSubdirectory("flowcert-fuzz-").FullName;
        var bytes = new Random(count);
        // One input in ten goes through a file (the streamed .ograph reader, the UTF-8 check), sometimes
        // with a byte that is not valid UTF-8; the rest are parsed from strings.
        string Read(string input, int t)
        {
            if (t % 10 != 0)
                return format is { } f ? Canonical(GraphFiles.Parse(input, "fuzz" + extension, f)) : CertificateWriter.Write(CertificateReader.Parse(input, "fuzz.json"));
            var data = new System.Text.UTF8Encoding(false).GetBytes(input);
            if (data.Length > 0 && bytes.Next(3) == 0) data[bytes.Next(data.Length)] = (byte)bytes.Next(0x80, 0x100);
            var path = Path.Combine(folder, "fuzz" + extension);
            File.WriteAllBytes(path, data);
            return format is not null ? Canonical(GraphFiles.Read(path)) : CertificateWriter.Write(CertificateReader.ReadFile(path));
        }
        Assert.NotEmpty(seeds);
        var mutator = new Mutator(reader.Length * 7919 + count);
        int results = 0, errors = 0;
        var failures = new List<string>();
        for (int t = 0; t < count; t++)
        {
            var input = mutator.Mutate(seeds[t % seeds.Length]);
            try
            {
                Assert.NotNull(Read(input, t));
                results++;
            }
            catch (GraphFormatException e) when (e.Line >= 1 && e.Column >= 1) { errors++; }
            catch (Exception e) when (e is GraphFileException or CertificateFormatException) { errors++; }
            catch (Exception e)
            {
                if (failures.Count < 3) failures.Add($"input #{t}: {e.GetType().Name}: {e.Message}\n{Excerpt.Of(input)}");
                else failures.Add("");
            }
        }
        Directory.Delete(folder, recursive: true);
        Assert.True(failures.Count == 0, $"{failures.Count} of {count} inputs ended in another exception:\n{string.Join("\n", failures.Take(3))}");
        // both outcomes occur, or the mutations did not exercise the reader
        Assert.True(errors > count / 10 && (reader == "certificate" || results > 0), $"{results} results, {errors} input errors");
    }

    private static string Extension(GraphFileFormat f) => f switch
    {
        GraphFileFormat.Ograph => ".ograph", GraphFileFormat.Graph6 => ".g6", GraphFileFormat.Sparse6 => ".s6",
        GraphFileFormat.MatrixMarket => ".mtx", _ => ".json",
    };

    // A graph written back in canonical form and read again (a result must be usable, not just returned).
    internal static string Canonical(OpenGraph g)
    {
        var canonical = CanonicalForm.Write(g);
        Assert.Equal(canonical, CanonicalForm.Write(OgraphReader.Parse(canonical, "canonical.ograph")));
        return canonical;
    }
}
