namespace FlowCert.Graphs.Families;

/// <summary>
/// The line and the two-dimensional lattices. Nodes are <c>r{row}c{column}</c> (the line: <c>c{column}</c>),
/// counted from 0; inputs are column 0 and outputs the last column; positions put column j at x = j and
/// row i at y = i (y grows downwards) unless the lattice's geometry says otherwise (docs/families.md).
/// "Periodic" wraps the rows, across the direction from inputs to outputs, making a cylinder.
/// </summary>
internal static class PlanarLattices
{
    /// <summary>√3/2 to three places: the row spacing of triangles and column spacing of hexagons in drawings.</summary>
    private const decimal HalfRootThree = 0.866m;

    internal static string Name(int row, int col) => $"r{row}c{col}";

    /// <summary>The path c0 - c1 - ... (a ring when periodic); input c0, output the last node.</summary>
    public static GraphDraft Line(int n, bool periodic)
    {
        if (periodic && n < 3) throw new FamilyParameterException("a periodic line (a ring) needs at least 3 nodes");
        var d = new GraphDraft("line", ["h"]);
        for (int j = 0; j < n; j++) d.Node($"c{j}", j, 0);
        for (int j = 0; j + 1 < n; j++) d.Edge($"c{j}", $"c{j + 1}", "h");
        if (periodic) d.Edge($"c{n - 1}", "c0", "h");
        d.Inputs.Add("c0");
        d.Outputs.Add($"c{n - 1}");
        return d;
    }

    /// <summary>The rows x cols square grid: directions h (along a row) and v (along a column).</summary>
    public static GraphDraft Square(int rows, int cols, bool periodic)
    {
        if (periodic && rows < 3) throw new FamilyParameterException("a periodic square lattice needs at least 3 rows");
        var d = Grid("square", ["h", "v"], rows, cols, (i, j) => (j, i));
        for (int i = 0; i < rows; i++)
            for (int j = 0; j < cols; j++)
            {
                if (j + 1 < cols) d.Edge(Name(i, j), Name(i, j + 1), "h");
                if (i + 1 < rows) d.Edge(Name(i, j), Name(i + 1, j), "v");
                else if (periodic) d.Edge(Name(i, j), Name(0, j), "v");
            }
        return d;
    }

    /// <summary>
    /// The honeycomb as a brick wall: every row is a zigzag path, and rows i and i + 1 are joined at the
    /// columns j with i + j even. Directions rise and fall (the two slants of a row, seen left to right)
    /// and v. Drawn as regular hexagons of side 1: x = 0.866 j, y = 1.5 i, plus 0.5 when i + j is even.
    /// Periodic needs an even number of rows.
    /// </summary>
    public static GraphDraft Hexagonal(int rows, int cols, bool periodic)
    {
        if (periodic && rows % 2 != 0) throw new FamilyParameterException("a periodic hexagonal lattice needs an even number of rows");
        var d = Grid("hexagonal", ["rise", "fall", "v"], rows, cols, (i, j) => (HalfRootThree * j, 1.5m * i + ((i + j) % 2 == 0 ? 0.5m : 0m)));
        for (int i = 0; i < rows; i++)
            for (int j = 0; j < cols; j++)
            {
                if (j + 1 < cols) d.Edge(Name(i, j), Name(i, j + 1), (i + j) % 2 == 0 ? "rise" : "fall");
                if ((i + j) % 2 != 0) continue;
                if (i + 1 < rows) d.Edge(Name(i, j), Name(i + 1, j), "v");
                else if (periodic) d.Edge(Name(i, j), Name(0, j), "v");
            }
        return d;
    }

    /// <summary>
    /// The triangular lattice with odd rows shifted half a step right: x = j + 0.5 (i odd), y = 0.866 i.
    /// Each node joins its row neighbours (h) and two nodes of the next row, down-left (dl) and
    /// down-right (dr). Periodic needs an even number of rows, at least 4.
    /// </summary>
    public static GraphDraft Triangular(int rows, int cols, bool periodic)
    {
        if (periodic && (rows % 2 != 0 || rows < 4)) throw new FamilyParameterException("a periodic triangular lattice needs an even number of rows, at least 4");
        var d = Grid("triangular", ["h", "dl", "dr"], rows, cols, (i, j) => (j + (i % 2 == 1 ? 0.5m : 0m), HalfRootThree * i));
        for (int i = 0; i < rows; i++)
        {
            int below = i + 1 < rows ? i + 1 : periodic ? 0 : -1;
            for (int j = 0; j < cols; j++)
            {
                if (j + 1 < cols) d.Edge(Name(i, j), Name(i, j + 1), "h");
                if (below < 0) continue;
                // Even rows sit half a step left of odd rows: below-left is column j - 1 from an even row, j from an odd one.
                int left = i % 2 == 0 ? j - 1 : j, right = left + 1;
                if (left >= 0) d.Edge(Name(i, j), Name(below, left), "dl");
                if (right < cols) d.Edge(Name(i, j), Name(below, right), "dr");
            }
        }
        return d;
    }

    /// <summary>
    /// The brickwork state of "Universal blind quantum computation" (arXiv:0807.4154): rows are paths, and
    /// with columns counted from 0, rows i and i + 1 are joined at columns j = 2, 4 (mod 8) when i is even
    /// and at columns j = 6, 0 (mod 8, j &gt; 0) when i is odd. The paper takes cols = 5 (mod 8); other widths
    /// end with the last column. Directions h and v.
    /// </summary>
    public static GraphDraft Brickwork(int rows, int cols)
    {
        var d = Grid("brickwork", ["h", "v"], rows, cols, (i, j) => (j, i));
        for (int i = 0; i < rows; i++)
            for (int j = 0; j < cols; j++)
            {
                if (j + 1 < cols) d.Edge(Name(i, j), Name(i, j + 1), "h");
                if (i + 1 < rows && HasBrickEdge(i, j)) d.Edge(Name(i, j), Name(i + 1, j), "v");
            }
        return d;
    }

    /// <summary>True when rows i and i + 1 of the brickwork state are joined at column j.</summary>
    internal static bool HasBrickEdge(int i, int j)
        => i % 2 == 0 ? j % 8 is 2 or 4 : j > 0 && j % 8 is 6 or 0;

    private static GraphDraft Grid(string family, IReadOnlyList<string> directions, int rows, int cols, Func<int, int, (decimal X, decimal Y)> position)
    {
        var d = new GraphDraft(family, directions);
        for (int i = 0; i < rows; i++)
            for (int j = 0; j < cols; j++)
            {
                var (x, y) = position(i, j);
                d.Node(Name(i, j), x, y);
            }
        for (int i = 0; i < rows; i++)
        {
            d.Inputs.Add(Name(i, 0));
            d.Outputs.Add(Name(i, cols - 1));
        }
        return d;
    }
}
