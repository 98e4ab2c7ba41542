namespace FlowCert.Algebra;

/// <summary>The field Q of exact rationals (the continuous-variable case).</summary>
public readonly struct RationalField : IField<Rational>
{
    public Rational Zero => Rational.Zero;
    public Rational One => Rational.One;
    public bool IsZero(Rational a) => a.IsZero;
    public bool AreEqual(Rational a, Rational b) => a == b;
    public Rational Add(Rational a, Rational b) => a + b;
    public Rational Subtract(Rational a, Rational b) => a - b;
    public Rational Negate(Rational a) => -a;
    public Rational Multiply(Rational a, Rational b) => a * b;
    public Rational Inverse(Rational a) => a.Reciprocal();
    public Rational FromRational(Rational r) => r;
    public string Format(Rational a) => a.ToString();
    public bool TryParse(string text, out Rational value)
        => Rational.TryParse(text, out value) && value.ToString() == text;
}
