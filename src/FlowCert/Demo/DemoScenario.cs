using System.Reflection;
using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Graphs;

namespace FlowCert.Demo;

/// <summary>One design of the built-in demo and the analyses run on it.</summary>
public sealed record DemoDesign(string Name, string Text, IReadOnlyList<FieldSpec> Fields)
{
    /// <summary>The design parsed as an open graph (parsed anew on every access).</summary>
    public OpenGraph Graph => OgraphReader.Parse(Text, Name + ".ograph");
}

/// <summary>
/// The built-in demo: the fictional Merrow Reach lab's designs (a continuous-variable wire, a qutrit
/// patch, a splitter whose flow depends on the field, a merge that has no flow, and a continuous-variable
/// delay pair whose two kinds of flow differ), each analysed over Q and small primes with both kinds of flow.
/// </summary>
public static class DemoScenario
{
    /// <summary>The flow kinds each design is analysed for, generalized first.</summary>
    public static readonly FlowKind[] Kinds = [FlowKind.General, FlowKind.Causal];

    /// <summary>
    /// The design the demo surveys over every prime at once (`flowcert primes`): the lab's qutrit patch, asking
    /// which qudit dimensions run it deterministically and how deep.
    /// </summary>
    public const string PrimeSurveyDesign = "qutrit-patch";

    /// <summary>The demo designs, each with the fields it is analysed over (Q, F_2, F_3, F_5).</summary>
    public static IReadOnlyList<DemoDesign> Designs()
    {
        FieldSpec[] all = [FieldSpec.Rationals, FieldSpec.PrimeField(2), FieldSpec.PrimeField(3), FieldSpec.PrimeField(5)];
        return
        [
            new("loop-wire", Resource("loop-wire"), all),
            new("qutrit-patch", Resource("qutrit-patch"), all),
            new("splitter-pair", Resource("splitter-pair"), all),
            new("merge-attempt", Resource("merge-attempt"), all),
            new("delay-pair", Resource("delay-pair"), all),
        ];
    }

    private static string Resource(string name)
    {
        using var s = Assembly.GetExecutingAssembly().GetManifestResourceStream($"FlowCert.Demo.{name}.ograph")
            ?? throw new InvalidOperationException($"demo resource {name} missing from the build");
        using var r = new StreamReader(s);
        return r.ReadToEnd();
    }
}
