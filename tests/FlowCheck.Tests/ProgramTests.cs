using static FlowCheck.Tests.Support;

namespace FlowCheck.Tests;

/// <summary>The command line and its exit codes (docs/checker.md): 0 valid, 1 invalid, 2 unreadable or usage.</summary>
public class ProgramTests
{
    [Theory]
    [InlineData("")]
    [InlineData("--graph g.ograph")]
    [InlineData("a.json b.json")]
    [InlineData("a.json --graph")]
    [InlineData("a.json --graph g1 --graph g2")]
    [InlineData("--help a.json")]
    [InlineData("a.json -x")]
    public void BadArgumentsPrintUsageAndExit2(string line)
    {
        var r = Run(line.Split(' ', StringSplitOptions.RemoveEmptyEntries));
        Assert.Equal(2, r.Code);
        Assert.Equal("", r.Out);
        Assert.Equal(Program.Usage + "\n", r.Err.ReplaceLineEndings("\n"));
    }

    [Theory]
    [InlineData("--help")]
    [InlineData("-h")]
    public void HelpPrintsUsageOnStandardOutputAndExitsZero(string option)
    {
        var r = Run(option);
        Assert.Equal(0, r.Code);
        Assert.StartsWith(Program.Usage + "\n", r.Out.ReplaceLineEndings("\n"));
        Assert.Contains("exit 0 valid, 1 invalid, 2 unreadable", r.Out);
        Assert.Equal("", r.Err);
    }

    [Fact]
    public void VersionPrintsTheVersionOfTheProjectFileAndExitsZero()
    {
        var r = Run("--version");
        Assert.Equal(0, r.Code);
        // the version the checker's own project file sets (it builds without the repository's Directory.Build.props)
        var project = File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "..", "..", "..", "..", "..", "checker", "FlowCheck", "FlowCheck.csproj"));
        var version = System.Text.RegularExpressions.Regex.Match(project, "<Version>([^<]+)</Version>").Groups[1].Value;
        Assert.NotEqual("", version);
        Assert.Equal($"flowcheck {version}\n", r.Out.ReplaceLineEndings("\n"));
    }

    [Fact]
    public void GraphOptionMayComeFirst()
    {
        var cert = Write(Examples.WireCausal().ToString(), ".json");
        var graph = Write("input a\noutput c\nedge a b\nedge b c\n", ".ograph");
        var r = Run("--graph", graph, cert);
        Assert.Equal(0, r.Code);
        Assert.Equal($"note: graph file {graph} matches the embedded graph", r.Out.ReplaceLineEndings("\n").Split('\n')[1]);
    }

    [Fact]
    public void MissingFilesAreUnreadable()
    {
        var r = Run("/nonexistent/cert.json");
        Assert.Equal(2, r.Code);
        Assert.Equal("", r.Out);
        Assert.StartsWith("unreadable: /nonexistent/cert.json: ", r.Err);
        var cert = Write(Examples.WireCausal().ToString(), ".json");
        var g = Run(cert, "--graph", "/nonexistent/g.ograph");
        Assert.Equal(2, g.Code);
        Assert.StartsWith("unreadable: /nonexistent/g.ograph: ", g.Err);
        var dir = Run(Path.GetTempPath());
        Assert.Equal(2, dir.Code);
        Assert.StartsWith("unreadable: ", dir.Err);
    }

    [Theory]
    [InlineData("", "not JSON")]
    [InlineData("{", "not JSON")]
    [InlineData("{\"format\": \"flowcert-certificate\", \"format\": \"flowcert-certificate\"}", "not JSON")]
    [InlineData("{} {}", ":1:4: not JSON: content after the JSON value")]
    [InlineData("{} /* c */", "content after the JSON value")]
    [InlineData("{} x", "not JSON")]
    public void TextThatIsNotOneJsonDocumentIsUnreadable(string text, string message)
    {
        var r = CheckText(text);
        Assert.Equal(2, r.Code);
        Assert.Equal("", r.Out);
        Assert.StartsWith("unreadable: ", r.Err);
        Assert.Contains(message, r.Err);
    }

    [Fact]
    public void DatesAndDecimalsAreNotReinterpreted()
    {
        // A date-like producer version stays a string; a decimal version is not the integer 1.
        var dated = Edit(Examples.WireCausal(), c => c["producer"]!["version"] = "2025-06-01T00:00:00Z");
        Assert.Equal(0, Check(dated).Code);
        var text = Examples.WireCausal().ToString().Replace("\"version\": 1,", "\"version\": 1.0,");
        AssertInvalid(CheckText(text), "invalid: version must be an integer, found float");
    }

    [Fact]
    public void MessagesStayOnOneLine()
    {
        var cert = Edit(Examples.WireCausal(), c => c["format"] = "two\nlines\t");
        var r = Check(cert);
        Assert.Equal("invalid: unknown format \"two\\u000alines\\u0009\"\n", r.Out.ReplaceLineEndings("\n"));
        var unreadable = CheckText("{\"a\":\n\n");
        Assert.DoesNotContain("\n", unreadable.Err.TrimEnd('\n', '\r'));
    }

    [Fact]
    public void GraphFileMustMatchTheEmbeddedGraph()
    {
        var same = Check(Examples.WireCausal(), "# same graph, other spelling\r\nedge c b 1.0\r\nedge b a\r\ninput a\r\noutput c\r\nat a 0 0\r\n");
        Assert.Equal(0, same.Code);
        var other = Check(Examples.WireCausal(), "input a\noutput c\nedge a b\nedge b c 2\n");
        AssertInvalid(other, "invalid: graph file ", " (sha256 ", ") differs from the embedded graph (sha256 6385fa1c");
        var bad = Check(Examples.WireCausal(), "input a\noutput c\nedge a b\nedge b c 0\n");
        Assert.Equal(2, bad.Code);
        Assert.Contains(":4:10: bad or zero weight \"0\"", bad.Err);
    }
}
