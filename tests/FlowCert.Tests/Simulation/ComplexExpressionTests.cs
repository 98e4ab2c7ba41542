using System.Numerics;
using FlowCert.Simulation;
using MathNet.Numerics.LinearAlgebra;

namespace FlowCert.Tests.Simulation;

/// <summary>The entry grammar of claimed matrices and angles (docs/circuits.md), values worked by hand.</summary>
public class ComplexExpressionTests
{
    [Theory]
    [InlineData("1/2", 0.5, 0)]
    [InlineData("i/sqrt(2)", 0, 0.70710678118654752)]
    [InlineData("-0.5+0.866025i", -0.5, 0.866025)]
    [InlineData("0.866025i", 0, 0.866025)]
    [InlineData("-i", 0, -1)]
    [InlineData("2e-1", 0.2, 0)]
    [InlineData("3pi/4", 2.35619449019234492, 0)]
    [InlineData("exp(i*pi)", -1, 0)]
    [InlineData("exp(i pi/2)", 0, 1)]
    [InlineData("(1+i)/2", 0.5, 0.5)]
    [InlineData("2^3", 8, 0)]
    [InlineData("-2^2", -4, 0)]
    [InlineData("cos(0) - sin(0)", 1, 0)]
    [InlineData(" 1 / 4 ", 0.25, 0)]
    public void EntriesEvaluateAsWorkedByHand(string text, double re, double im)
    {
        var z = ComplexExpression.Parse(text, 3);
        Assert.True(Math.Abs(z.Real - re) < 1e-12 && Math.Abs(z.Imaginary - im) < 1e-12, $"{text} = {z}");
    }

    [Fact]
    public void WIsThePthRootOfUnity()
    {
        // w = exp(2 pi i / 3) = -1/2 + i sqrt(3)/2 (by hand); w^3 = 1.
        var w = ComplexExpression.Parse("w", 3);
        Assert.True((w - new Complex(-0.5, Math.Sqrt(3) / 2)).Magnitude < 1e-12);
        Assert.True((ComplexExpression.Parse("w^3", 3) - 1).Magnitude < 1e-12);
        Assert.True((ComplexExpression.Parse("w", 2) + 1).Magnitude < 1e-12);
    }

    [Theory]
    [InlineData("1/0", 2, "division by zero")]
    [InlineData("2*", 2, "a number is missing")]
    [InlineData("sqrt 2", 5, "'(' must follow sqrt")]
    [InlineData("(1+2", 4, "')' is missing")]
    [InlineData("1 2", 2, "unexpected '2'")]
    [InlineData("half", 0, "unknown name 'half'")]
    [InlineData("1..2", 2, "unexpected '.'")]
    public void MalformedEntriesNameWhereTheyGoWrong(string text, int offset, string message)
    {
        var e = Assert.Throws<ExpressionException>(() => ComplexExpression.Parse(text, 3));
        Assert.Equal(offset, e.Offset);
        Assert.Contains(message, e.Message);
    }

    [Fact]
    public void DeepNestingIsRefusedRatherThanOverflowingTheStack()
    {
        // A thread stack of 1 MiB (as .NET gives secondary threads), so that unbounded recursion would crash the test host here.
        string[] texts = [new string('(', 100_000) + "1", new string('-', 100_000) + "1",
                          string.Concat(Enumerable.Repeat("2^", 100_000)) + "1", string.Concat(Enumerable.Repeat("sqrt(", 100_000)) + "1"];
        var caught = new Exception?[texts.Length];
        var thread = new Thread(() =>
        {
            for (int k = 0; k < texts.Length; k++)
                try { ComplexExpression.Parse(texts[k], 3); }
                catch (Exception e) { caught[k] = e; }
        }, 1024 * 1024);
        thread.Start();
        thread.Join();
        Assert.All(caught, e => Assert.Contains($"nested deeper than {ComplexExpression.MaxDepth} levels", Assert.IsType<ExpressionException>(e).Message));
        // The limit itself is reachable: MaxDepth - 1 brackets around a number are read.
        Assert.Equal(1, ComplexExpression.Parse(new string('(', ComplexExpression.MaxDepth - 1) + "1" + new string(')', ComplexExpression.MaxDepth - 1), 3).Real);
    }

    [Fact]
    public void AWrittenMapReadsBackAsAClaim()
    {
        var m = Matrix<Complex>.Build.DenseOfArray(new[,] { { new Complex(0.5, -0.25), new Complex(0, 1) }, { new Complex(-1e-14, 0), new Complex(-0.75, 0) } });
        var map = new ImplementedMap(2, ["a"], ["b"], m);
        var back = MapFiles.ReadClaim(MapFiles.Json(map, "F2"), "map.json", 2, 2, 2);
        Assert.True((back - m).FrobeniusNorm() < 1e-12);
        Assert.Contains("\"0.5-0.25i\", \"i\"", MapFiles.Json(map, "F2"));
        Assert.Contains("[\"0\", \"-0.75\"]", MapFiles.Json(map, "F2"));
    }
}
