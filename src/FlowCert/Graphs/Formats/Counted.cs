using System.Globalization;

namespace FlowCert.Graphs.Formats;

/// <summary>A count with its noun in the right number, as every message writes one: "1 input", "2 inputs".</summary>
public static class Counted
{
    /// <summary><paramref name="n"/> and the noun, singular for 1, else the plural (the singular plus "s" unless given).</summary>
    public static string Of(long n, string singular, string? plural = null)
        => n.ToString(CultureInfo.InvariantCulture) + " " + (n == 1 ? singular : plural ?? singular + "s");
}
