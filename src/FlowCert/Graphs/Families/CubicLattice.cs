namespace FlowCert.Graphs.Families;

/// <summary>
/// The simple cubic lattice of x by y by z nodes <c>x{a}y{b}z{c}</c>, counted from 0, with directions x, y
/// and z. Inputs are the face a = 0 and outputs the face a = x - 1. Drawn in oblique projection: the
/// node sits at (2a + 0.8c, 2b - 0.6c), so edges along x and y are drawn twice as long as edges along z
/// and deeper layers move up and to the right. Periodic wraps y and z (each needs at least 3 nodes).
/// </summary>
internal static class CubicLattice
{
    internal static string Name(int a, int b, int c) => $"x{a}y{b}z{c}";

    public static GraphDraft Build(int sx, int sy, int sz, bool periodic)
    {
        if (periodic && (sy < 3 || sz < 3))
            throw new FamilyParameterException("a periodic cubic lattice wraps y and z, so each needs at least 3 nodes");
        var d = new GraphDraft("cubic", ["x", "y", "z"]);
        for (int a = 0; a < sx; a++)
            for (int b = 0; b < sy; b++)
                for (int c = 0; c < sz; c++)
                    d.Node(Name(a, b, c), 2 * a + 0.8m * c, 2 * b - 0.6m * c);
        for (int a = 0; a < sx; a++)
            for (int b = 0; b < sy; b++)
                for (int c = 0; c < sz; c++)
                {
                    var here = Name(a, b, c);
                    if (a + 1 < sx) d.Edge(here, Name(a + 1, b, c), "x");
                    if (b + 1 < sy) d.Edge(here, Name(a, b + 1, c), "y");
                    else if (periodic) d.Edge(here, Name(a, 0, c), "y");
                    if (c + 1 < sz) d.Edge(here, Name(a, b, c + 1), "z");
                    else if (periodic) d.Edge(here, Name(a, b, 0), "z");
                }
        for (int b = 0; b < sy; b++)
            for (int c = 0; c < sz; c++)
            {
                d.Inputs.Add(Name(0, b, c));
                d.Outputs.Add(Name(sx - 1, b, c));
            }
        return d;
    }
}
