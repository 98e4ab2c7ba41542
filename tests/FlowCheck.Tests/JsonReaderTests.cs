using System.Text;
using Newtonsoft.Json;
using Newtonsoft.Json.Linq;
using static FlowCheck.Tests.Support;

namespace FlowCheck.Tests;

/// <summary>The checker's own JSON reader: strict RFC 8259 ("The JavaScript Object Notation (JSON) Data
/// Interchange Format", RFC 8259, DOI 10.17487/RFC8259), read in 64 KiB chunks, faults named by line and column.</summary>
public class JsonReaderTests
{
    static string Wire => Examples.WireCausal().ToString(Formatting.None);

    [Theory]
    [InlineData("{'format': 1}", ":1:2: not JSON: expected a key in double quotes")]
    [InlineData("{format: 1}", ":1:2: not JSON: expected a key in double quotes")]
    [InlineData("{\"a\": 'x'}", ":1:7: not JSON: unexpected character '''")]
    [InlineData("{\"a\": 1,}", ":1:9: not JSON: expected a key in double quotes")]
    [InlineData("{\"a\": [1,]}", ":1:10: not JSON: unexpected character ']'")]
    [InlineData("{\"a\": 1 \"b\": 2}", ":1:9: not JSON: expected ',' or '}'")]
    [InlineData("{\"a\" 1}", ":1:6: not JSON: expected ':'")]
    [InlineData("{} // comment", ":1:4: not JSON: content after the JSON value")]
    [InlineData("/* c */ {}", ":1:1: not JSON: unexpected character '/'")]
    [InlineData("{\"a\": 01}", ":1:8: not JSON: expected ',' or '}'")]
    [InlineData("{\"a\": +1}", ":1:7: not JSON: unexpected character '+'")]
    [InlineData("{\"a\": .5}", ":1:7: not JSON: unexpected character '.'")]
    [InlineData("{\"a\": 1.}", ":1:9: not JSON: a digit must follow")]
    [InlineData("{\"a\": 1e}", ":1:9: not JSON: a digit must follow")]
    [InlineData("{\"a\": -}", ":1:8: not JSON: a digit must follow")]
    [InlineData("{\"a\": 0x1}", ":1:8: not JSON: expected ',' or '}'")]
    [InlineData("{\"a\": NaN}", ":1:7: not JSON: unexpected character 'N'")]
    [InlineData("{\"a\": True}", ":1:7: not JSON: unexpected character 'T'")]
    [InlineData("{\"a\": nul}", ":1:10: not JSON: misspelt literal")]
    [InlineData("{\"a\": \"x\\q\"}", ":1:10: not JSON: unknown escape")]
    [InlineData("{\"a\": \"\\ud800\"}", "not JSON: lone high surrogate")]
    [InlineData("{\"a\": \"\\udc00\"}", "not JSON: lone low surrogate")]
    [InlineData("{\"a\": \"\\u12g4\"}", "not JSON: \\u needs four hex digits")]
    [InlineData("{\"a\": \"tab\there\"}", ":1:11: not JSON: control character in a string")]
    [InlineData("{\"a\": \"nul\0\"}", ":1:11: not JSON: control character in a string")]
    [InlineData("{\"a\": 1}\0", ":1:9: not JSON: content after the JSON value")]
    [InlineData("\0{}", ":1:1: not JSON: NUL byte")]
    [InlineData("{\"a\": {\"b\": 1, \"b\": 2}}", "not JSON: duplicate key \"b\"")]
    [InlineData("{\"a\": 1, \"c\": 2, \"b\": 3, \"a\": 4}", ":1:30: not JSON: duplicate key \"a\"")] // found among the sorted keys before the first out of order
    [InlineData("{\"c\": 1, \"a\": 2, \"b\": 3, \"b\": 4}", ":1:30: not JSON: duplicate key \"b\"")] // found among the keys after it
    [InlineData("{\"a\": 1, \"b\": 2, \"b\": 3}", ":1:22: not JSON: duplicate key \"b\"")] // the key just before
    [InlineData("{\n  \"a\": [\n    1,\n    ]\n}", ":4:5: not JSON: unexpected character ']'")]
    [InlineData("{\"a\": \"unfinished", "not JSON: unexpected end of the text")]
    [InlineData("\u00a0{}", ":1:1: not JSON: unexpected byte")]
    public void LenientJsonIsRefusedWithLineAndColumn(string text, string message)
    {
        var r = CheckText(text);
        Assert.Equal(2, r.Code);
        Assert.Equal("", r.Out);
        Assert.StartsWith("unreadable: ", r.Err);
        Assert.Contains(message, r.Err);
    }

    [Theory]
    [InlineData("{\"c\": 1, \"a\": 2, \"b\": 3, \"d\": 4}")]
    [InlineData("{\"b\": 1, \"a\": 2, \"d\": 3, \"c\": 4}")]
    [InlineData("{\"e\": {\"x\": 1, \"y\": 2}, \"d\": {\"y\": 1, \"x\": 2}}")]
    public void KeysOutOfOrderAreNotDuplicates(string text)
    {
        var r = CheckText(text); // valid JSON, so the verdict is about the content: unknown keys
        Assert.Equal(1, r.Code);
        Assert.StartsWith("invalid: unknown key", r.Out);
    }

    [Fact]
    public void BytesThatAreNotUtf8AndAByteOrderMarkAreRefused()
    {
        var invalid = Encoding.UTF8.GetBytes(Wire.Replace("\"tests\"", "\"t\u00e9sts\""));
        var e = Array.IndexOf(invalid, (byte)0xC3);
        invalid[e + 1] = 0x28; // a lead byte followed by an ASCII byte
        AssertUnreadable(invalid, "not JSON: a string that is not UTF-8");
        AssertUnreadable([0xEF, 0xBB, 0xBF, .. Encoding.UTF8.GetBytes(Wire)], ":1:1: not JSON: unexpected byte");
        var overlong = Encoding.UTF8.GetBytes(Wire.Replace("\"tests\"", "\"t!sts\""));
        var i = Array.IndexOf(overlong, (byte)'!');
        AssertUnreadable([.. overlong[..i], 0xC0, 0xA1, .. overlong[(i + 1)..]], "not JSON: a string that is not UTF-8");
    }

    static void AssertUnreadable(byte[] bytes, string message)
    {
        var path = Write("", ".json");
        File.WriteAllBytes(path, bytes);
        var r = Run(path);
        Assert.Equal(2, r.Code);
        Assert.Contains(message, r.Err);
    }

    [Fact]
    public void NestingIsLimited()
    {
        var deep = Wire.Replace("\"producer\":", "\"extra\":" + new string('[', 100) + new string(']', 100) + ",\"producer\":");
        Assert.Contains("not JSON: nesting deeper than 64 levels", CheckText(deep).Err);
        // 1,000,000 levels must not overflow the stack either.
        Assert.Contains("not JSON: nesting deeper than 64 levels", CheckText(new string('[', 1_000_000)).Err);
    }

    // \u escapes decoded where the value matters (RFC 8259 section 7): hex digits in either case, and a
    // surrogate pair read as the one character it encodes (echoed in the message about the flow kind).
    [Theory]
    [InlineData("f\\u006Cowcert-certificate")]
    [InlineData("f\\u006cowcert-certificate")]
    [InlineData("\\u0066lowcert-certificate")]
    public void EscapedCharactersInAValueThatMattersAreDecoded(string format)
    {
        var r = CheckText(Wire.Replace("flowcert-certificate", format));
        Assert.Equal("", r.Err);
        Assert.Equal(0, r.Code);
    }

    [Fact]
    public void ASurrogatePairIsOneCharacter()
    {
        var r = CheckText(Wire.Replace("\"flow\":\"causal\"", "\"flow\":\"x\\uD83D\\uDE00y\""));
        Assert.NotEqual(0, r.Code);
        Assert.Contains("x\U0001F600y", r.Out + r.Err);
    }

    [Fact]
    public void EscapesWhiteSpaceAndKeyOrderDoNotMatter()
    {
        var cert = Examples.WireCausal();
        cert["producer"]!["name"] = "t\u00e9sts \ud83d\ude00 \"quoted\" \\ /";
        var reordered = new JObject(cert.Properties().Reverse());
        reordered["graph"] = new JObject(((JObject)cert["graph"]!).Properties().Reverse());
        var text = reordered.ToString(Formatting.Indented).Replace("\n", "\r\n\t ")
            .Replace("flowcert-certificate", "flowcert\\u002dcertificate").Replace("\\ud83d\\ude00", "\\uD83D\\uDE00");
        var r = CheckText(text);
        Assert.Equal("", r.Err);
        Assert.Equal(0, r.Code);
        Assert.StartsWith("valid: causal flow over Q, depth 2", r.First);
    }

    [Fact]
    public void ValuesAndTokensAcrossChunkBoundariesAreReadWhole()
    {
        // Padding moves every token of the certificate across the 65,536-byte boundary of the first chunk,
        // one byte at a time; escapes and a multi-byte character sit next to the boundary too.
        var cert = Examples.WireCausal();
        cert["producer"]!["name"] = "\u00e9\\\"\u20ac\ud83d\ude00x";
        var text = cert.ToString(Formatting.None);
        var expected = Check(cert).First;
        for (var pad = 65_536 - text.Length - 2; pad <= 65_536; pad++)
        {
            var r = CheckText(new string(' ', pad) + text);
            Assert.True(r.Code == 0 && r.First == expected, $"padding {pad}: {r.Out}{r.Err}");
        }
        var lines = string.Concat(Enumerable.Repeat("  \n", 30_000));
        var late = CheckText("{\"format\":" + lines + "  'x'}");
        Assert.Contains($":{30_001}:3: not JSON: unexpected character '''", late.Err);
    }

    [Fact]
    public void EchoedValuesAreCutAt80Characters()
    {
        var longName = new string('x', 500);
        var r = Check(Edit(Examples.WireCausal(), c => c["format"] = longName));
        AssertInvalid(r, $"unknown format \"{new string('x', 80)}...\"");
        Assert.DoesNotContain(new string('x', 81), r.Out);
        var key = CheckText(Wire.Replace("\"producer\":", $"\"{longName}\":1,\"producer\":"));
        AssertInvalid(key, $"unknown key \"{new string('x', 80)}...\" in certificate");
        var depth = CheckText(Wire.Replace("\"depth\":2", "\"depth\":" + new string('9', 5000)));
        AssertInvalid(depth, "depth is a number of 16610 bits but there are 2 rounds");
    }

    [Fact]
    public void NumbersOfRfc8259GrammarAreReadEvenWhenHuge()
    {
        // 1e999999 is a valid JSON number (RFC 8259 section 6): the version is then a float, a verdict (exit 1).
        AssertInvalid(CheckText(Wire.Replace("\"version\":1", "\"version\":1e999999")), "invalid: version must be an integer, found float");
        AssertInvalid(CheckText(Wire.Replace("\"version\":1", "\"version\":-0.5E+3")), "invalid: version must be an integer, found float");
        AssertInvalid(CheckText(Wire.Replace("\"version\":1", "\"version\":true")), "invalid: version must be an integer, found boolean");
    }
}

/// <summary>--quiet: no progress line even when standard error is a terminal (docs/checker.md).</summary>
public class QuietOptionTests
{
    [Fact]
    public void QuietIsAcceptedAnywhereAndSilencesTheTerminal()
    {
        var cert = Write(Examples.WireCausal().ToString(), ".json");
        foreach (var args in new[] { new[] { cert, "--quiet" }, ["--quiet", cert] })
        {
            var (stdout, stderr) = (new StringWriter(), new StringWriter());
            Assert.Equal(0, Program.Run(args, stdout, stderr, progress: (0, 0)));
            Assert.StartsWith("valid: causal flow over Q, depth 2", stdout.ToString());
            Assert.Equal("", stderr.ToString());
        }
        Assert.Contains("[--quiet]", Program.Usage);
    }
}
