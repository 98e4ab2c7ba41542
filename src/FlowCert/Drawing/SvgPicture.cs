using System.Text;
using FlowCert.Flows;
using static FlowCert.Drawing.SvgText;

namespace FlowCert.Drawing;

/// <summary>
/// Draws a <see cref="FlowPicture"/> as SVG. The visual language (explained by the legend drawn in the
/// picture): measured nodes are blue circles, outputs green; an input has a dark wire arrow entering from
/// the left and an output one leaving to the right; edges are grey lines labelled with their weight
/// unless it is 1; a correction is an orange curved arrow from a measured node to each node of its
/// correction vector, labelled with the coefficient unless it is 1; a blocked set is red. Columns carry
/// their titles on top. Labels are left out above <see cref="FlowPicture.MaxLabelledNodes"/> nodes.
/// </summary>
public static class SvgPicture
{
    internal const double Radius = 11, Stub = 24;
    /// <summary>The palette of every picture (SVG and DOT).</summary>
    public const string EdgeColour = "#8f99a3", CorrectionColour = "#d9730d", WireColour = "#1f2933", TextColour = "#1f2933";
    /// <summary>Node fills and outlines by role.</summary>
    public const string MeasuredFill = "#e3eefa", MeasuredStroke = "#2f5d8a", OutputFill = "#dff2df", OutputStroke = "#2e7d32";
    /// <summary>Fill and outline of the nodes of a blocked set.</summary>
    public const string BlockedFill = "#fbe0e0", BlockedStroke = "#c62828";

    /// <summary>The SVG document of a laid-out picture, legend included.</summary>
    public static string Write(FlowPicture p)
    {
        var g = p.Graph;
        var result = p.Result;
        var blocked = result?.Obstruction?.Nodes.ToHashSet() ?? [];
        var legend = SvgLegend.Lines(p);
        double contentRight = g.NodeCount == 0 ? PictureLayout.Left : p.X.Max() + Radius + Stub + 20;
        double contentBottom = g.NodeCount == 0 ? PictureLayout.Top : p.Y.Max() + Radius + 26;
        double legendTop = contentBottom + 20;
        string subtitle = $"{Count(g.NodeCount, "node")}, {Count(g.Edges.Count, "edge")}, {Count(g.Inputs.Count, "input")}, {Count(g.Outputs.Count, "output")}";
        double width = Math.Ceiling(Math.Max(Math.Max(contentRight + 20, SvgLegend.Width(legend) + 40),
            Math.Max(Width(p.Title, 16) + 40, Width(subtitle, 12) + 40)));
        double height = Math.Ceiling(legendTop + SvgLegend.Height(legend) + 20);

        var s = new StringBuilder();
        s.Append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        s.Append($"<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{F(width)}\" height=\"{F(height)}\" viewBox=\"0 0 {F(width)} {F(height)}\" font-family=\"DejaVu Sans, Verdana, sans-serif\">\n");
        s.Append("<defs>\n");
        s.Append(Marker("correction-head", CorrectionColour));
        s.Append(Marker("wire-head", WireColour));
        s.Append("</defs>\n");
        s.Append($"<rect x=\"0.0\" y=\"0.0\" width=\"{F(width)}\" height=\"{F(height)}\" fill=\"#ffffff\"/>\n");
        s.Append($"<text x=\"20.0\" y=\"32.0\" font-size=\"16\" font-weight=\"bold\" fill=\"{TextColour}\">{Escape(p.Title)}</text>\n");
        s.Append($"<text x=\"20.0\" y=\"52.0\" font-size=\"12\" fill=\"#52606d\">{Escape(subtitle)}</text>\n");

        s.Append("<g id=\"column-titles\" font-size=\"12\" font-weight=\"bold\" fill=\"#52606d\" text-anchor=\"middle\">\n");
        foreach (var (x, text) in p.ColumnTitles)
            s.Append($"<text x=\"{F(x)}\" y=\"{F(PictureLayout.Top - 38)}\">{Escape(text)}</text>\n");
        s.Append("</g>\n");

        var routes = EdgeRoutes.For(p);
        s.Append($"<g id=\"edges\" fill=\"none\" stroke=\"{EdgeColour}\" stroke-width=\"1.6\">\n");
        foreach (var route in routes) s.Append(route.Element).Append('\n');
        s.Append("</g>\n");
        if (p.ShowLabels)
        {
            s.Append("<g id=\"weights\" font-size=\"10\" fill=\"#3e4c59\" stroke=\"#ffffff\" stroke-width=\"3\" paint-order=\"stroke\">\n");
            for (int k = 0; k < g.Edges.Count; k++)
            {
                if (g.Edges[k].Weight == Algebra.Rational.One) continue;
                // Beside a steep edge, above a flat one, so the label never sits on the line or under a name.
                var (_, mx, my, steep) = routes[k];
                s.Append(steep
                    ? $"<text x=\"{F(mx + 5)}\" y=\"{F(my + 3.5)}\" text-anchor=\"start\">"
                    : $"<text x=\"{F(mx)}\" y=\"{F(my - 4)}\" text-anchor=\"middle\">");
                s.Append(Escape(g.Edges[k].Weight.ToString())).Append("</text>\n");
            }
            s.Append("</g>\n");
        }

        if (result is { HasFlow: true })
            AppendCorrections(s, p, result);

        s.Append($"<g id=\"wires\" stroke=\"{WireColour}\" stroke-width=\"2\" marker-end=\"url(#wire-head)\">\n");
        foreach (var v in g.SortedInputs)
            s.Append($"<line x1=\"{F(p.X[v] - Radius - Stub)}\" y1=\"{F(p.Y[v])}\" x2=\"{F(p.X[v] - Radius - 3)}\" y2=\"{F(p.Y[v])}\"/>\n");
        foreach (var v in g.SortedOutputs)
            s.Append($"<line x1=\"{F(p.X[v] + Radius + 2)}\" y1=\"{F(p.Y[v])}\" x2=\"{F(p.X[v] + Radius + Stub - 1)}\" y2=\"{F(p.Y[v])}\"/>\n");
        s.Append("</g>\n");

        s.Append("<g id=\"nodes\" stroke-width=\"1.8\">\n");
        for (int v = 0; v < g.NodeCount; v++)
        {
            var (fill, stroke) = blocked.Contains(v) ? (BlockedFill, BlockedStroke)
                : g.Outputs.Contains(v) ? (OutputFill, OutputStroke) : (MeasuredFill, MeasuredStroke);
            var extra = blocked.Contains(v) ? " stroke-width=\"3\"" : "";
            s.Append($"<circle cx=\"{F(p.X[v])}\" cy=\"{F(p.Y[v])}\" r=\"{F(Radius)}\" fill=\"{fill}\" stroke=\"{stroke}\"{extra}/>\n");
        }
        s.Append("</g>\n");
        if (p.ShowLabels)
        {
            s.Append($"<g id=\"names\" font-size=\"10\" fill=\"{TextColour}\" text-anchor=\"middle\" stroke=\"#ffffff\" stroke-width=\"3\" paint-order=\"stroke\">\n");
            for (int v = 0; v < g.NodeCount; v++)
                s.Append($"<text x=\"{F(p.X[v])}\" y=\"{F(p.Y[v] + Radius + 12)}\">{Escape(g.Names[v])}</text>\n");
            s.Append("</g>\n");
        }
        SvgLegend.Append(s, legend, legendTop);
        s.Append("</svg>\n");
        return s.ToString();
    }

    private static void AppendCorrections(StringBuilder s, FlowPicture p, FlowResult result)
    {
        var labels = new StringBuilder();
        s.Append($"<g id=\"corrections\" fill=\"none\" stroke=\"{CorrectionColour}\" stroke-width=\"1.5\" stroke-opacity=\"0.9\" marker-end=\"url(#correction-head)\">\n");
        foreach (var (v, vector) in result.Corrections.OrderBy(kv => kv.Key))
            foreach (var (u, value) in vector.Entries)
            {
                var (path, lx, ly) = CurvedArrow(p.X[v], p.Y[v], p.X[u], p.Y[u]);
                s.Append($"<path d=\"{path}\"/>\n");
                if (p.ShowLabels && !value.IsOne)
                    labels.Append($"<text x=\"{F(lx)}\" y=\"{F(ly)}\">{Escape(value.ToString())}</text>\n");
            }
        s.Append("</g>\n");
        if (labels.Length > 0)
            s.Append($"<g id=\"coefficients\" font-size=\"10\" font-weight=\"bold\" fill=\"{CorrectionColour}\" text-anchor=\"middle\" stroke=\"#ffffff\" stroke-width=\"3\" paint-order=\"stroke\">\n").Append(labels).Append("</g>\n");
    }

    /// <summary>
    /// A quadratic curve from circle to circle, bent to the left of the direction of travel so that it
    /// stands apart from the straight edge between the same nodes; returns the path and where its label goes.
    /// </summary>
    internal static (string Path, double LabelX, double LabelY) CurvedArrow(double x1, double y1, double x2, double y2)
    {
        double dx = x2 - x1, dy = y2 - y1, length = Math.Max(Math.Sqrt(dx * dx + dy * dy), 1e-9);
        double bend = Math.Min(0.22 * length, 48);
        double cx = (x1 + x2) / 2 + dy / length * bend, cy = (y1 + y2) / 2 - dx / length * bend;
        (double, double) Towards(double fx, double fy, double tx, double ty, double by)
        {
            double ux = tx - fx, uy = ty - fy, l = Math.Max(Math.Sqrt(ux * ux + uy * uy), 1e-9);
            return (fx + ux / l * by, fy + uy / l * by);
        }
        var (sx, sy) = Towards(x1, y1, cx, cy, Radius + 1);
        var (ex, ey) = Towards(x2, y2, cx, cy, Radius + 2);
        // The label sits at t = 0.7 along the curve, nearer the target, so that labels of arrows leaving
        // one node for different targets do not meet where the arrows cross.
        const double t = 0.7;
        double lx = (1 - t) * (1 - t) * sx + 2 * t * (1 - t) * cx + t * t * ex;
        double ly = (1 - t) * (1 - t) * sy + 2 * t * (1 - t) * cy + t * t * ey;
        return ($"M{F(sx)},{F(sy)} Q{F(cx)},{F(cy)} {F(ex)},{F(ey)}", lx, ly - 3);
    }

    private static string Marker(string id, string colour)
        => $"<marker id=\"{id}\" viewBox=\"0 0 10 10\" refX=\"9\" refY=\"5\" markerWidth=\"7\" markerHeight=\"7\" markerUnits=\"userSpaceOnUse\" orient=\"auto\"><path d=\"M0,0 L10,5 L0,10 z\" fill=\"{colour}\"/></marker>\n";
}
