using System.Globalization;
using System.Numerics;

namespace FlowCert.Simulation;

/// <summary>A malformed number: what is wrong and the 0-based offset in the text where it starts.</summary>
public sealed class ExpressionException(int offset, string problem) : Exception(problem)
{
    /// <summary>The 0-based offset of the problem in the text parsed.</summary>
    public int Offset { get; } = offset;
}

/// <summary>
/// The small grammar of matrix entries and angles (docs/circuits.md, "Numbers"), evaluated in double
/// precision (simulation only):
/// <code>
/// expr    = term { ("+" | "-") term }
/// term    = unary { ("*" | "/") unary | factor }      a factor right after another multiplies it: 2i, 3pi/4, i/sqrt(2)
/// unary   = ("+" | "-") unary | power
/// power   = factor [ "^" unary ]
/// factor  = number | "i" | "pi" | "w" | ("sqrt" | "exp" | "cos" | "sin") "(" expr ")" | "(" expr ")"
/// number  = digits [ "." digits ] [ ("e" | "E") [ "+" | "-" ] digits ]
/// </code>
/// "w" is exp(2 pi i / p) for the dimension p given; spaces are ignored. Nesting (brackets, signs and
/// powers) deeper than <see cref="MaxDepth"/> is refused, so a hostile file cannot overflow the stack.
/// </summary>
public static class ComplexExpression
{
    /// <summary>The deepest nesting of brackets, signs and powers read (common practice for recursive-descent readers of untrusted input).</summary>
    public const int MaxDepth = 200;

    /// <summary>Evaluates the text; throws <see cref="ExpressionException"/> with the offset of the first problem.</summary>
    public static Complex Parse(string text, int dimension)
    {
        var parser = new Parser(text, dimension);
        var value = parser.Expr();
        parser.SkipSpace();
        if (!parser.AtEnd) throw new ExpressionException(parser.Position, $"unexpected '{text[parser.Position]}'");
        if (double.IsNaN(value.Real) || double.IsNaN(value.Imaginary) || double.IsInfinity(value.Real) || double.IsInfinity(value.Imaginary))
            throw new ExpressionException(0, $"'{text}' is not a finite number");
        return value;
    }

    /// <summary>Evaluates a real number: as <see cref="Parse"/>, with an imaginary part of at most 1e-12 allowed and dropped.</summary>
    public static double ParseReal(string text, int dimension)
    {
        var z = Parse(text, dimension);
        if (Math.Abs(z.Imaginary) > 1e-12) throw new ExpressionException(0, $"'{text}' is not a real number");
        return z.Real;
    }

    private sealed class Parser(string text, int p)
    {
        public int Position;
        public bool AtEnd => Position >= text.Length;

        public void SkipSpace() { while (!AtEnd && char.IsWhiteSpace(text[Position])) Position++; }

        private bool Accept(char c)
        {
            SkipSpace();
            if (AtEnd || text[Position] != c) return false;
            Position++;
            return true;
        }

        public Complex Expr()
        {
            var value = Term();
            while (true)
            {
                if (Accept('+')) value += Term();
                else if (Accept('-')) value -= Term();
                else return value;
            }
        }

        private Complex Term()
        {
            var value = Unary();
            while (true)
            {
                if (Accept('*')) value *= Unary();
                else if (Accept('/'))
                {
                    int at = Position;
                    var divisor = Unary();
                    if (divisor == Complex.Zero) throw new ExpressionException(at, "division by zero");
                    value /= divisor;
                }
                else if (StartsFactor()) value *= Power();
                else return value;
            }
        }

        private bool StartsFactor()
        {
            SkipSpace();
            return !AtEnd && (char.IsAsciiLetter(text[Position]) || text[Position] == '(');
        }

        private int depth;

        // Every recursion of the grammar passes through here, so this bounds the stack.
        private Complex Unary()
        {
            SkipSpace();
            if (++depth > MaxDepth) throw new ExpressionException(Position, $"nested deeper than {MaxDepth} levels");
            try
            {
                if (Accept('-')) return -Unary();
                if (Accept('+')) return Unary();
                return Power();
            }
            finally { depth--; }
        }

        private Complex Power()
        {
            var value = Factor();
            if (Accept('^')) return Complex.Pow(value, Unary());
            return value;
        }

        private Complex Factor()
        {
            SkipSpace();
            if (AtEnd) throw new ExpressionException(Position, "a number is missing");
            char c = text[Position];
            if (c == '(')
            {
                Position++;
                var inner = Expr();
                if (!Accept(')')) throw new ExpressionException(Position, "')' is missing");
                return inner;
            }
            if (char.IsAsciiDigit(c) || c == '.') return Number();
            if (char.IsAsciiLetter(c))
            {
                int start = Position;
                while (!AtEnd && char.IsAsciiLetter(text[Position])) Position++;
                var word = text[start..Position];
                switch (word)
                {
                    case "i": return Complex.ImaginaryOne;
                    case "pi": return new Complex(Math.PI, 0);
                    case "w": return Complex.FromPolarCoordinates(1, 2 * Math.PI / p);
                    case "sqrt" or "exp" or "cos" or "sin":
                        if (!Accept('(')) throw new ExpressionException(Position, $"'(' must follow {word}");
                        var argument = Expr();
                        if (!Accept(')')) throw new ExpressionException(Position, "')' is missing");
                        return word switch
                        {
                            "sqrt" => Complex.Sqrt(argument),
                            "exp" => Complex.Exp(argument),
                            "cos" => Complex.Cos(argument),
                            _ => Complex.Sin(argument),
                        };
                    default: throw new ExpressionException(start, $"unknown name '{word}' (known: i, pi, w, sqrt, exp, cos, sin)");
                }
            }
            throw new ExpressionException(Position, $"unexpected '{c}'");
        }

        private Complex Number()
        {
            int start = Position;
            while (!AtEnd && char.IsAsciiDigit(text[Position])) Position++;
            if (!AtEnd && text[Position] == '.')
            {
                Position++;
                while (!AtEnd && char.IsAsciiDigit(text[Position])) Position++;
            }
            // An exponent only when digits follow: "2e3" is 2000, "2exp(1)" is 2 * exp(1).
            if (!AtEnd && text[Position] is 'e' or 'E')
            {
                int k = Position + 1;
                if (k < text.Length && text[k] is '+' or '-') k++;
                if (k < text.Length && char.IsAsciiDigit(text[k]))
                {
                    Position = k;
                    while (!AtEnd && char.IsAsciiDigit(text[Position])) Position++;
                }
            }
            var digits = text[start..Position];
            if (!double.TryParse(digits, NumberStyles.AllowDecimalPoint | NumberStyles.AllowExponent, CultureInfo.InvariantCulture, out var x))
                throw new ExpressionException(start, $"'{digits}' is not a number");
            return new Complex(x, 0);
        }
    }
}
