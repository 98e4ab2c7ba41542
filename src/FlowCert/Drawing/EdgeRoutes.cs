using static FlowCert.Drawing.SvgText;

namespace FlowCert.Drawing;

/// <summary>How one edge is drawn: its SVG element and where its weight label goes.</summary>
internal readonly record struct EdgeRoute(string Element, double LabelX, double LabelY, bool Steep);

/// <summary>
/// Routes edges: a straight line, unless that line would pass over another node (an edge inside one
/// column, or the wrap-around edge of a periodic lattice), in which case a curve bent to one side, so
/// that no edge can be mistaken for two. The check is skipped above <see cref="MaxNodesChecked"/> nodes.
/// </summary>
internal static class EdgeRoutes
{
    public const int MaxNodesChecked = 2000;

    public static EdgeRoute[] For(FlowPicture p)
    {
        var g = p.Graph;
        var routes = new EdgeRoute[g.Edges.Count];
        for (int k = 0; k < g.Edges.Count; k++)
        {
            var e = g.Edges[k];
            double x1 = p.X[e.U], y1 = p.Y[e.U], x2 = p.X[e.V], y2 = p.Y[e.V];
            bool steep = Math.Abs(y2 - y1) > Math.Abs(x2 - x1);
            if (g.NodeCount > MaxNodesChecked || !PassesOverANode(p, e.U, e.V))
            {
                routes[k] = new($"<line x1=\"{F(x1)}\" y1=\"{F(y1)}\" x2=\"{F(x2)}\" y2=\"{F(y2)}\"/>", (x1 + x2) / 2, (y1 + y2) / 2, steep);
                continue;
            }
            double dx = x2 - x1, dy = y2 - y1, length = Math.Sqrt(dx * dx + dy * dy);
            double bend = Math.Min(0.3 * length, 70);
            double cx = (x1 + x2) / 2 + dy / length * bend, cy = (y1 + y2) / 2 - dx / length * bend;
            routes[k] = new($"<path d=\"M{F(x1)},{F(y1)} Q{F(cx)},{F(cy)} {F(x2)},{F(y2)}\"/>",
                0.25 * x1 + 0.5 * cx + 0.25 * x2, 0.25 * y1 + 0.5 * cy + 0.25 * y2, steep);
        }
        return routes;
    }

    /// <summary>True when the segment from u to v comes within a node's radius of another node's centre.</summary>
    private static bool PassesOverANode(FlowPicture p, int u, int v)
    {
        double x1 = p.X[u], y1 = p.Y[u], dx = p.X[v] - x1, dy = p.Y[v] - y1, lengthSquared = dx * dx + dy * dy;
        if (lengthSquared == 0) return false;
        double clearance = SvgPicture.Radius + 1;
        for (int w = 0; w < p.Graph.NodeCount; w++)
        {
            if (w == u || w == v) continue;
            double t = ((p.X[w] - x1) * dx + (p.Y[w] - y1) * dy) / lengthSquared;
            if (t <= 0 || t >= 1) continue;
            double px = x1 + t * dx - p.X[w], py = y1 + t * dy - p.Y[w];
            if (px * px + py * py < clearance * clearance) return true;
        }
        return false;
    }
}
