using FlowCert.Algebra;

namespace FlowCert.Tests.Algebra;

/// <summary>FieldElement keeps Q and F_p apart and formats as docs/formats.md says (common practice for residues).</summary>
public class FieldElementTests
{
    [Fact]
    public void ResiduesHaveNoSignAndNegateModP()
    {
        var x = FieldElement.OfResidue(2, 7);
        Assert.False(x.IsNegative);
        Assert.Equal(FieldElement.OfResidue(5, 7), x.Negate());
        Assert.Equal("5", x.Negate().ToString());
        Assert.Equal(FieldElement.OfResidue(0, 7), FieldElement.OfResidue(0, 7).Negate());
        Assert.Throws<ArgumentOutOfRangeException>(() => FieldElement.OfResidue(7, 7));
    }

    [Fact]
    public void RationalsKeepTheirSignAndText()
    {
        var x = FieldElement.OfRational(Rational.Create(-3, 6));
        Assert.True(x.IsNegative);
        Assert.Equal("-1/2", x.ToString());
        Assert.Equal("1/2", x.Negate().ToString());
        Assert.True(FieldElement.OfRational(Rational.One).IsOne);
    }

    [Fact]
    public void TheSameValueInDifferentFieldsIsNotEqual()
    {
        Assert.NotEqual(FieldElement.OfResidue(1, 3), FieldElement.OfResidue(1, 5));
        Assert.NotEqual(FieldElement.OfResidue(1, 3), FieldElement.OfRational(Rational.One));
        Assert.Throws<ArgumentException>(() => FieldElement.Of(FieldSpec.Rationals, 1UL));
        Assert.Throws<InvalidOperationException>(() => FieldElement.OfResidue(1, 3).AsRational);
    }
}
