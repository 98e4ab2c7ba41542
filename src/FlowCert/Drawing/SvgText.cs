using System.Globalization;
using System.Text;

namespace FlowCert.Drawing;

/// <summary>
/// Small helpers for SVG written by hand: numbers with one fixed decimal in the invariant culture (never
/// "-0.0"), XML-escaped text, and a rough width of a text line for sizing boxes.
/// </summary>
internal static class SvgText
{
    /// <summary>A coordinate with one decimal: <c>12.5</c>, <c>-3.0</c>.</summary>
    public static string F(double v)
    {
        var rounded = Math.Round(v, 1, MidpointRounding.AwayFromZero);
        if (rounded == 0) rounded = 0; // turns -0 into 0
        return rounded.ToString("0.0", CultureInfo.InvariantCulture);
    }

    /// <summary>Text content or attribute value with &amp;, &lt;, &gt; and quotes escaped.</summary>
    public static string Escape(string s)
    {
        var sb = new StringBuilder(s.Length);
        foreach (var c in s)
            sb.Append(c switch
            {
                '&' => "&amp;",
                '<' => "&lt;",
                '>' => "&gt;",
                '"' => "&quot;",
                '\'' => "&apos;",
                _ when c < 0x20 => " ",
                _ => c.ToString(),
            });
        return sb.ToString();
    }

    /// <summary>"1 node", "2 nodes".</summary>
    public static string Count(int n, string noun) => n == 1 ? $"1 {noun}" : $"{n} {noun}s";

    /// <summary>An upper estimate of the width of a line of text in DejaVu Sans at a font size.</summary>
    public static double Width(string s, double fontSize) => s.Length * fontSize * 0.62;
}
