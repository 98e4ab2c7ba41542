namespace FlowCert.Flows;

/// <summary>
/// How far a flow search has come, reported after each layer through an <see cref="IProgress{T}"/> given to
/// <see cref="FlowSolver.Solve(Graphs.OpenGraph, Algebra.FieldSpec, FlowKind, IProgress{SolveProgress})"/> (the library prints nothing; a caller decides what to show).
/// </summary>
/// <param name="Layers">Layers found so far (counted from the outputs; each becomes a round of the flow).</param>
/// <param name="NodesProcessed">Nodes whose correction is settled, outputs included.</param>
/// <param name="NodeCount">All nodes of the graph.</param>
public readonly record struct SolveProgress(int Layers, int NodesProcessed, int NodeCount);
