using FlowCert.Flows;
using FlowCert.Graphs;

namespace FlowCert.Drawing;

/// <summary>How the nodes of a picture were placed (said in its legend).</summary>
public enum PictureArrangement
{
    /// <summary>Columns are the rounds of a flow, round 1 first, outputs last.</summary>
    Rounds,
    /// <summary>The position hints (<c>at</c> lines) of the graph file.</summary>
    PositionHints,
    /// <summary>Columns are the distance from the nearest input (nodes no input reaches follow, by component).</summary>
    DistanceFromInputs,
}

/// <summary>
/// A laid-out picture: the graph, the certificate's result if any, a centre for every node in pixels,
/// the titles of the columns, and whether the picture is small enough for labels.
/// </summary>
public sealed class FlowPicture
{
    /// <summary>Graphs with more nodes than this are drawn without names, weights or coefficients.</summary>
    public const int MaxLabelledNodes = 60;

    /// <summary>The graph drawn.</summary>
    public required OpenGraph Graph { get; init; }
    /// <summary>The flow or obstruction to draw, or null for the graph alone.</summary>
    public required FlowResult? Result { get; init; }
    /// <summary>The title line (see <see cref="TitleFor"/>).</summary>
    public required string Title { get; init; }
    /// <summary>How the nodes were placed.</summary>
    public required PictureArrangement Arrangement { get; init; }
    /// <summary>Node centres in pixels, by node index.</summary>
    public required double[] X { get; init; }
    /// <summary>Node centres' heights in pixels (downwards), by node index.</summary>
    public required double[] Y { get; init; }
    /// <summary>Column headings (centre x and text), empty when the layout has no columns.</summary>
    public required IReadOnlyList<(double X, string Text)> ColumnTitles { get; init; }

    /// <summary>True when the graph is small enough for names, weights and coefficients.</summary>
    public bool ShowLabels => Graph.NodeCount <= MaxLabelledNodes;

    /// <summary>The title line of a picture: the file's name and what the certificate says.</summary>
    public static string TitleFor(string graphName, FlowResult? r) => r switch
    {
        null => graphName,
        { HasFlow: true } => $"{graphName}: {Kind(r)} flow over {r.Field.Name}, minimum depth {r.Depth}",
        _ => $"{graphName}: no {Kind(r)} flow over {r.Field.Name}",
    };

    private static string Kind(FlowResult r) => FlowKinds.Adjective(r.Kind);
}
