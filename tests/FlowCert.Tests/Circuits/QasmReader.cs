using System.Globalization;
using System.Numerics;
using System.Text.RegularExpressions;
using MathNet.Numerics.LinearAlgebra;

namespace FlowCert.Tests.Circuits;

/// <summary>
/// A small reader of the OpenQASM 3.0 subset the circuit writer uses, following the specification's
/// grammar (OpenQASM 3.0 language specification, openqasm.com; "OpenQASM 3: A broader and deeper quantum
/// assembly language", arXiv:2104.14722 (from memory)): the version statement, an include of
/// stdgates.inc, line and block comments, one qubit register declaration qubit[n] name, and gate calls
/// name[(expression)] operand {, operand}; with operands name[integer]. Expressions are a float or
/// integer literal with an optional sign. Gates mean what stdgates.inc defines: h = U(pi/2, 0, pi),
/// p(l) = ctrl @ gphase(l) = diag(1, e^(i l)), cz = ctrl @ z with z = p(pi); U(t, f, l) is the
/// specification's built-in [[cos(t/2), -e^(i l) sin(t/2)], [e^(i f) sin(t/2), e^(i (f + l)) cos(t/2)]].
/// </summary>
public static class QasmReader
{
    private static readonly MatrixBuilder<Complex> M = Matrix<Complex>.Build;

    public static Matrix<Complex> U(double t, double f, double l) => M.DenseOfArray(new[,]
    {
        { new Complex(Math.Cos(t / 2), 0), -Complex.FromPolarCoordinates(1, l) * Math.Sin(t / 2) },
        { Complex.FromPolarCoordinates(1, f) * Math.Sin(t / 2), Complex.FromPolarCoordinates(1, f + l) * Math.Cos(t / 2) },
    });

    public static Matrix<Complex> P(double l) => M.DenseOfDiagonalArray([Complex.One, Complex.FromPolarCoordinates(1, l)]);

    /// <summary>The qubit count and the gates, as (kind, wires, parameter) for <see cref="CircuitMatrix.Unitary"/>.</summary>
    public static (int Qubits, List<(string Kind, int[] Wires, object Parameter)> Gates) Read(string text)
    {
        // Comments first: // to the end of the line, /* ... */ anywhere (the specification's two kinds).
        text = Regex.Replace(text, @"/\*.*?\*/", " ", RegexOptions.Singleline);
        text = Regex.Replace(text, @"//[^\n]*", "");
        var statements = text.Split(';').Select(s => s.Trim()).ToList();
        if (statements[^1].Length != 0) throw new FormatException($"text after the last statement: '{statements[^1]}'");
        statements.RemoveAt(statements.Count - 1);
        if (statements.Count == 0 || !Regex.IsMatch(statements[0], @"^OPENQASM\s+3(\.0)?$")) throw new FormatException("the program must start with OPENQASM 3.0;");
        string? register = null;
        int qubits = 0;
        var gates = new List<(string, int[], object)>();
        bool included = false;
        foreach (var s in statements.Skip(1))
        {
            Match m;
            if ((m = Regex.Match(s, "^include\\s+\"([^\"]+)\"$")).Success)
            {
                if (m.Groups[1].Value != "stdgates.inc") throw new FormatException($"unknown include {m.Groups[1].Value}");
                included = true;
            }
            else if ((m = Regex.Match(s, @"^qubit\s*\[\s*(\d+)\s*\]\s+([A-Za-z_][A-Za-z0-9_]*)$")).Success)
            {
                if (register is not null) throw new FormatException("a second register");
                qubits = int.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture);
                register = m.Groups[2].Value;
            }
            else if ((m = Regex.Match(s, @"^([A-Za-z_][A-Za-z0-9_]*)\s*(\(\s*([^)]*)\))?\s+(.+)$")).Success)
            {
                if (!included) throw new FormatException($"gate {m.Groups[1].Value} used before stdgates.inc is included");
                if (register is null) throw new FormatException("a gate before the qubit declaration");
                var operands = m.Groups[4].Value.Split(',').Select(o =>
                {
                    var om = Regex.Match(o.Trim(), @"^([A-Za-z_][A-Za-z0-9_]*)\s*\[\s*(\d+)\s*\]$");
                    if (!om.Success || om.Groups[1].Value != register) throw new FormatException($"bad operand '{o}'");
                    int k = int.Parse(om.Groups[2].Value, CultureInfo.InvariantCulture);
                    if (k >= qubits) throw new FormatException($"qubit {k} out of range");
                    return k;
                }).ToArray();
                double? parameter = m.Groups[2].Success ? Literal(m.Groups[3].Value) : null;
                string name = m.Groups[1].Value;
                switch (name, operands.Length, parameter.HasValue)
                {
                    case ("h", 1, false): gates.Add(("matrix", operands, U(Math.PI / 2, 0, Math.PI))); break;
                    case ("p", 1, true): gates.Add(("matrix", operands, P(parameter!.Value))); break;
                    case ("cz", 2, false):
                        if (operands[0] == operands[1]) throw new FormatException("cz on one qubit twice");
                        gates.Add(("cz", operands, 1)); // ctrl @ p(pi): |j,k> -> (-1)^(j k) |j,k>, which is CZ^1 for p = 2
                        break;
                    default: throw new FormatException($"'{s}' is not in the subset read here");
                }
            }
            else throw new FormatException($"unknown statement '{s}'");
        }
        return (qubits, gates);
    }

    // The specification's float literal (digits, a point, an exponent with e or E) or integer literal, with a sign.
    private static double Literal(string text)
    {
        var t = text.Trim();
        if (!Regex.IsMatch(t, @"^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$")) throw new FormatException($"'{text}' is not a literal");
        return double.Parse(t, NumberStyles.Float, CultureInfo.InvariantCulture);
    }
}
