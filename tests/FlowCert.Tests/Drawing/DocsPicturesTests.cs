using System.Globalization;
using System.Xml.Linq;
using FlowCert.Certificates;
using FlowCert.Drawing;
using FlowCert.Graphs;
using FlowCert.Graphs.Families;
using FlowCert.Graphs.Formats;
using FlowCert.Tests.Certificates;

namespace FlowCert.Tests.Drawing;

/// <summary>The pictures committed under docs/img are exactly what the current code draws (docs/families.md says how).</summary>
public class DocsPicturesTests
{
    private static readonly Dictionary<string, FamilyRequest> FamilyPictures = new()
    {
        ["line-6"] = new() { Family = "line", Size = "6" },
        ["square-4x5"] = new() { Family = "square", Size = "4x5" },
        ["hexagonal-4x6"] = new() { Family = "hexagonal", Size = "4x6" },
        ["triangular-4x5"] = new() { Family = "triangular", Size = "4x5" },
        ["brickwork-4x13"] = new() { Family = "brickwork", Size = "4x13" },
        ["cubic-3x3x3"] = new() { Family = "cubic", Size = "3x3x3" },
        ["random-14"] = new() { Family = "random", Size = "14", Probability = "1/4", InputCount = 2, OutputCount = 2, Seed = 2 },
        ["regular-12"] = new() { Family = "regular", Size = "12", Degree = 3, InputCount = 2, OutputCount = 2, Seed = 1 },
    };

    private static string Docs(params string[] parts) => Path.Combine([CorpusTests.RepositoryRoot(), "docs", .. parts]);

    public static TheoryData<string> FamilyNames() => [.. FamilyPictures.Keys];

    [Theory]
    [MemberData(nameof(FamilyNames))]
    public void FamilyPictureIsCurrent(string name)
    {
        // As the command does it: generate, write the file, read it back, draw it.
        var written = OgraphWriter.Write(FamilyGenerator.Generate(FamilyPictures[name]));
        var g = OgraphReader.Parse(written, name + ".ograph");
        var svg = SvgPicture.Write(PictureLayout.Arrange(g, null, FlowPicture.TitleFor(name + ".ograph", null)));
        Assert.Equal(svg, File.ReadAllText(Docs("img", $"family-{name}.svg")));
    }

    [Fact]
    public void EveryFamilyHasASectionAndAPictureInFamiliesMd()
    {
        var text = File.ReadAllText(Docs("families.md"));
        foreach (var family in FamilyGenerator.Catalog)
        {
            Assert.Contains($"\n### {family.Name}\n", text);
            var picture = FamilyPictures.Keys.Single(k => k.StartsWith(family.Name + "-"));
            Assert.Contains($"](img/family-{picture}.svg)", text);
        }
    }

    [Theory]
    [InlineData("qutrit-patch", "F5", true)]
    [InlineData("splitter-pair", "Q", true)]
    [InlineData("merge-attempt", "Q", false)]
    public void CertificatePictureIsCurrent(string design, string field, bool hasPng)
    {
        var root = CorpusTests.RepositoryRoot();
        var g = OgraphReader.ReadFile(Path.Combine(root, "certificates", design + ".ograph"));
        var result = CertificateReader.ReadFile(Path.Combine(root, "certificates", $"{design}.{field}.general.json")) with { Graph = g };
        var svg = SvgPicture.Write(PictureLayout.Arrange(g, result, FlowPicture.TitleFor(design + ".ograph", result)));
        Assert.Equal(svg, File.ReadAllText(Docs("img", $"{design}-{field}.svg")));
        if (!hasPng) return;
        var png = PngImage.Read(File.ReadAllBytes(Docs("img", $"{design}-{field}.png")));
        var root2 = XDocument.Parse(svg).Root!;
        double Size(string attribute) => double.Parse((string)root2.Attribute(attribute)!, CultureInfo.InvariantCulture);
        Assert.Equal(((int)Size("width"), (int)Size("height")), (png.Width, png.Height));
    }
}
