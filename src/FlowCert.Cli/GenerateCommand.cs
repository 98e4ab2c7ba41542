using System.CommandLine;
using FlowCert.Graphs.Families;
using FlowCert.Graphs;
using FlowCert.Graphs.Formats;

namespace FlowCert.Cli;

/// <summary><c>flowcert generate FAMILY --size S [options] --out FILE</c>: a member of a standard family.</summary>
public static class GenerateCommand
{
    public static Command Create(TextWriter stdout)
    {
        var family = new Argument<string>("FAMILY") { Description = "line, square, hexagonal, triangular, brickwork, cubic, random or regular" };
        var size = new Option<string>("--size") { Description = "N (line, random, regular), RxC (rows by columns) or XxYxZ (cubic)", Required = true };
        var periodic = new Option<bool>("--periodic") { Description = "wrap the rows (cubic: y and z) into a cylinder; the line becomes a ring" };
        var probability = new Option<string?>("--probability") { Description = "random: edge probability, exact, such as 1/10 or 0.1" };
        var degree = new Option<int?>("--degree") { Description = "regular: the degree of every node" };
        var inputCount = new Option<int?>("--input-count") { Description = "random, regular: the first K nodes are inputs" };
        var outputCount = new Option<int?>("--output-count") { Description = "random, regular: the last K nodes are outputs" };
        var seed = new SeedOption("seed of the random structure and weights (default 0)", 0);
        var weight = new Option<string?>("--weight") { Description = "one weight for every edge (default 1)" };
        var directionWeights = new Option<string?>("--direction-weights") { Description = "a weight per lattice direction, such as h=1,v=-1/2 (others weigh 1)" };
        var randomWeights = new Option<string?>("--random-weights") { Description = "draw each edge's weight from this list, such as 1,-1,1/2, using --seed" };
        var output = new PathOption("--out") { Description = "the graph file to write (.ograph with position hints, or .g6 .s6 .mtx .json .dot)", Required = true };
        var cmd = new Command("generate", "Write a lattice or random graph of a standard family (docs/families.md)")
            { family, size, periodic, probability, degree, inputCount, outputCount, seed, weight, directionWeights, randomWeights, output };
        cmd.SetAction(p =>
        {
            var weightOptions = new[] { p.GetValue(weight), p.GetValue(directionWeights), p.GetValue(randomWeights) };
            if (weightOptions.Count(w => w is not null) > 1)
                throw new UserInputException("give at most one of --weight, --direction-weights and --random-weights");
            WeightRule rule = p.GetValue(weight) is { } w1 ? new WeightRule.Constant(WeightRule.ParseWeight(w1, "weight"))
                : p.GetValue(directionWeights) is { } w2 ? WeightRule.ParsePerDirection(w2)
                : p.GetValue(randomWeights) is { } w3 ? WeightRule.ParseChoice(w3)
                : WeightRule.Unit;
            var request = new FamilyRequest
            {
                Family = p.GetValue(family)!, Size = p.GetValue(size)!, Periodic = p.GetValue(periodic),
                Probability = p.GetValue(probability), Degree = p.GetValue(degree),
                InputCount = p.GetValue(inputCount), OutputCount = p.GetValue(outputCount),
                Seed = p.GetValue(seed), Weights = rule,
            };
            return Execute(request, p.GetValue(output)!, stdout);
        });
        return cmd;
    }

    public static int Execute(FamilyRequest request, string outPath, TextWriter stdout)
    {
        var format = GraphFiles.FormatOf(outPath);
        var g = FamilyGenerator.Generate(request);
        SafeFile.WriteAllText(outPath, GraphFiles.Write(g, format));
        stdout.WriteLine($"wrote {Escaped.Of(outPath)}: {request.Family} {request.Size}, {Counted.Of(g.NodeCount, "node")}, {Counted.Of(g.Edges.Count, "edge")}, {Counted.Of(g.Inputs.Count, "input")}, {Counted.Of(g.Outputs.Count, "output")}" + ConvertCommand.TerminalsNote(g, format));
        return ExitCode.Flow;
    }
}
