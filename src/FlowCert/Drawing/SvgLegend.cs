using System.Text;
using FlowCert.Flows;
using FlowCert.Graphs;
using static FlowCert.Drawing.SvgPicture;
using static FlowCert.Drawing.SvgText;

namespace FlowCert.Drawing;

/// <summary>
/// The legend drawn under a picture: one line per element that appears in it, plus notes (among them the
/// edges whose weight is 0 in the certificate's field).
/// </summary>
internal static class SvgLegend
{
    /// <summary>The sample drawn before a legend line.</summary>
    internal enum Glyph { None, Input, Output, Measured, Edge, Correction, Blocked }

    internal readonly record struct Line(Glyph Glyph, string Text);

    private const double LineHeight = 22, GlyphWidth = 52, FontSize = 12, Left = 20;

    public static List<Line> Lines(FlowPicture p)
    {
        var g = p.Graph;
        var r = p.Result;
        var lines = new List<Line>();
        if (g.Inputs.Count > 0) lines.Add(new(Glyph.Input, "input: its state enters here (not prepared in the plus state)"));
        if (g.Outputs.Count > 0) lines.Add(new(Glyph.Output, "output: never measured"));
        if (g.NodeCount > g.Outputs.Count) lines.Add(new(Glyph.Measured, r is { HasFlow: false } ? "measured node outside the blocked set" : "measured node"));
        if (g.Edges.Count > 0) lines.Add(new(Glyph.Edge, "edge, labelled with its weight (no label: weight 1)"));
        if (r is not null && r.VanishedEdges is { Count: > 0 } vanished)
            lines.Add(new(Glyph.None, VanishingEdges.Warning(g, r.Field, vanished)));
        if (r is { HasFlow: true })
        {
            lines.Add(new(Glyph.Correction, $"correction: from a measured node to each node of its correction vector over {r.Field.Name} (no label: coefficient 1)"));
            lines.Add(new(Glyph.None, $"columns: the {Count(r.Depth, "measurement round")} of a {KindText(r.Kind)} flow of minimum depth, round 1 first; outputs last"));
        }
        if (r?.Obstruction is { } b)
        {
            lines.Add(new(Glyph.Blocked, $"blocked set ({Count(b.Nodes.Count, "node")}): none of them can be corrected from outside it, so no {KindText(r.Kind)} flow over {r.Field.Name} exists"));
            if (r.Kind == FlowKind.General)
                lines.Add(new(Glyph.None, $"the certificate proves it with {Count(b.Witnesses.Count, "left-kernel witness vector")}"));
        }
        if (p.Arrangement == PictureArrangement.PositionHints) lines.Add(new(Glyph.None, "layout: the position hints (at lines) of the graph file"));
        if (p.Arrangement == PictureArrangement.DistanceFromInputs) lines.Add(new(Glyph.None, "columns: distance from the nearest input (nodes no input reaches come after)"));
        if (!p.ShowLabels)
            lines.Add(new(Glyph.None, $"names, weights and coefficients are not shown above {FlowPicture.MaxLabelledNodes} nodes ({g.NodeCount} here)"));
        return lines;
    }

    private static string KindText(FlowKind k) => FlowKinds.Adjective(k);

    public static double Width(List<Line> lines)
        => 24 + GlyphWidth + lines.Select(l => SvgText.Width(l.Text, FontSize)).DefaultIfEmpty(0).Max();

    public static double Height(List<Line> lines) => 34 + lines.Count * LineHeight + 8;

    public static void Append(StringBuilder s, List<Line> lines, double top)
    {
        double width = Width(lines), height = Height(lines);
        s.Append("<g id=\"legend\">\n");
        s.Append($"<rect x=\"{F(Left - 8)}\" y=\"{F(top)}\" width=\"{F(width)}\" height=\"{F(height)}\" rx=\"6\" fill=\"#f7f9fb\" stroke=\"#cbd2d9\"/>\n");
        s.Append($"<text x=\"{F(Left)}\" y=\"{F(top + 22)}\" font-size=\"13\" font-weight=\"bold\" fill=\"{TextColour}\">Legend</text>\n");
        for (int k = 0; k < lines.Count; k++)
        {
            double y = top + 34 + k * LineHeight + LineHeight / 2;
            AppendGlyph(s, lines[k].Glyph, Left, y);
            var style = lines[k].Glyph == Glyph.None ? " font-style=\"italic\" fill=\"#52606d\"" : $" fill=\"{TextColour}\"";
            s.Append($"<text x=\"{F(Left + GlyphWidth)}\" y=\"{F(y + 4)}\" font-size=\"{FontSize}\"{style}>{Escape(lines[k].Text)}</text>\n");
        }
        s.Append("</g>\n");
    }

    private static void AppendGlyph(StringBuilder s, Glyph glyph, double x, double y)
    {
        string Circle(double cx, string fill, string stroke, double width = 1.8)
            => $"<circle cx=\"{F(cx)}\" cy=\"{F(y)}\" r=\"8.0\" fill=\"{fill}\" stroke=\"{stroke}\" stroke-width=\"{F(width)}\"/>\n";
        string Wire(double x1, double x2)
            => $"<line x1=\"{F(x1)}\" y1=\"{F(y)}\" x2=\"{F(x2)}\" y2=\"{F(y)}\" stroke=\"{WireColour}\" stroke-width=\"2\" marker-end=\"url(#wire-head)\"/>\n";
        switch (glyph)
        {
            case Glyph.Input:
                s.Append(Wire(x, x + 18)).Append(Circle(x + 30, MeasuredFill, MeasuredStroke));
                break;
            case Glyph.Output:
                s.Append(Circle(x + 10, OutputFill, OutputStroke)).Append(Wire(x + 20, x + 38));
                break;
            case Glyph.Measured:
                s.Append(Circle(x + 18, MeasuredFill, MeasuredStroke));
                break;
            case Glyph.Blocked:
                s.Append(Circle(x + 18, BlockedFill, BlockedStroke, 3));
                break;
            case Glyph.Edge:
                s.Append($"<line x1=\"{F(x)}\" y1=\"{F(y)}\" x2=\"{F(x + 38)}\" y2=\"{F(y)}\" stroke=\"{EdgeColour}\" stroke-width=\"1.6\"/>\n");
                s.Append($"<text x=\"{F(x + 19)}\" y=\"{F(y - 4)}\" font-size=\"10\" fill=\"#3e4c59\" text-anchor=\"middle\" stroke=\"#ffffff\" stroke-width=\"3\" paint-order=\"stroke\">w</text>\n");
                break;
            case Glyph.Correction:
                s.Append($"<path d=\"M{F(x)},{F(y + 5)} Q{F(x + 19)},{F(y - 12)} {F(x + 38)},{F(y + 5)}\" fill=\"none\" stroke=\"{CorrectionColour}\" stroke-width=\"1.5\" marker-end=\"url(#correction-head)\"/>\n");
                break;
        }
    }
}
