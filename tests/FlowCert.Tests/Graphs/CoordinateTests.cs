using System.Globalization;
using System.Text.RegularExpressions;
using FlowCert.Graphs;

namespace FlowCert.Tests.Graphs;

/// <summary>
/// The `at` coordinate reader against the rule it replaced: the pattern -?[0-9]{1,9}(\.[0-9]{1,9})? and
/// .NET's decimal parser for the value (same bits, so the same scale and sign), on every short string over
/// the characters that matter and on random longer ones.
/// </summary>
public class CoordinateTests
{
    private static readonly Regex Rule = new(@"^-?[0-9]{1,9}(\.[0-9]{1,9})?\z");

    private static void Agrees(string t)
    {
        bool expected = Rule.IsMatch(t) && decimal.TryParse(t, NumberStyles.AllowLeadingSign | NumberStyles.AllowDecimalPoint, CultureInfo.InvariantCulture, out var want);
        bool got = OgraphReader.TryParseCoordinate(t, out var value);
        Assert.True(expected == got, $"'{t}': expected {(expected ? "accepted" : "refused")}");
        if (expected)
        {
            decimal.TryParse(t, NumberStyles.AllowLeadingSign | NumberStyles.AllowDecimalPoint, CultureInfo.InvariantCulture, out var reference);
            Assert.Equal(decimal.GetBits(reference), decimal.GetBits(value));
        }
    }

    [Fact]
    public void EveryShortStringIsReadAsTheRuleReadsIt()
    {
        const string alphabet = "-.0179x ";
        var strings = new List<string> { "" };
        for (int length = 1; length <= 4; length++)
            strings = strings.Concat(strings.Where(s => s.Length == length - 1).SelectMany(s => alphabet.Select(c => s + c))).ToList();
        foreach (var t in strings) Agrees(t);
        foreach (var t in new[] { "-0", "-0.0", "0.000000000", "999999999.999999999", "-999999999.999999999", "1234567890", "1.1234567890", "-", "1.", ".5", "--1", "+1", "1e3" })
            Agrees(t);
    }

    [Fact]
    public void RandomLongerStringsAreReadAsTheRuleReadsThem()
    {
        var rng = new Random(5);
        for (int n = 0; n < 20_000; n++)
        {
            var chars = new char[rng.Next(1, 22)];
            for (int i = 0; i < chars.Length; i++) chars[i] = rng.Next(10) switch { 0 => '-', 1 => '.', _ => (char)('0' + rng.Next(10)) };
            Agrees(new string(chars));
        }
    }
}
