using System.Numerics;
using System.Text.RegularExpressions;
using FlowCert.Algebra;

namespace FlowCert.Graphs.Formats;

/// <summary>Decimal text read and written exactly: <c>2.505e+02</c> is 501/2, and 1/4 is written <c>0.25</c>.</summary>
public static partial class ExactDecimal
{
    /// <summary>The largest exponent accepted, so that a typo cannot ask for a number with a billion digits.</summary>
    public const int MaxExponent = 4000;

    [GeneratedRegex(@"^([+-]?)([0-9]*)(?:\.([0-9]*))?(?:[eE]([+-]?[0-9]+))?\z")]
    private static partial Regex Pattern();

    /// <summary>
    /// Parses <c>[+-]digits[.digits][e[+-]digits]</c> (at least one digit before or after the point) into
    /// the rational it denotes exactly. False on anything else, or an exponent beyond <see cref="MaxExponent"/>.
    /// </summary>
    public static bool TryParse(string text, out Rational value)
    {
        value = Rational.Zero;
        var m = Pattern().Match(text);
        if (!m.Success) return false;
        string whole = m.Groups[2].Value, fraction = m.Groups[3].Value;
        if (whole.Length + fraction.Length == 0) return false;
        long exponent = 0;
        if (m.Groups[4].Success && (!long.TryParse(m.Groups[4].Value, System.Globalization.NumberStyles.AllowLeadingSign, System.Globalization.CultureInfo.InvariantCulture, out exponent) || Math.Abs(exponent) > MaxExponent)) return false;
        var digits = BigInteger.Parse("0" + whole + fraction, System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture);
        if (m.Groups[1].Value == "-") digits = -digits;
        long shift = exponent - fraction.Length;
        value = shift >= 0
            ? Rational.FromInteger(digits * BigInteger.Pow(10, (int)shift))
            : Rational.Create(digits, BigInteger.Pow(10, (int)-shift));
        return true;
    }

    /// <summary>True when the text is a decimal whose exponent is beyond <see cref="MaxExponent"/> (such as <c>1e5000</c>), the one decimal <see cref="TryParse"/> refuses for its size.</summary>
    public static bool ExponentTooLarge(string text)
    {
        var m = Pattern().Match(text);
        return m.Success && m.Groups[4].Success
            && (!long.TryParse(m.Groups[4].Value, System.Globalization.NumberStyles.AllowLeadingSign, System.Globalization.CultureInfo.InvariantCulture, out var exponent) || Math.Abs(exponent) > MaxExponent);
    }

    /// <summary>
    /// Writes a rational as a plain decimal (<c>-0.5</c>, <c>3</c>, <c>0.125</c>) when it has one, that is
    /// when its denominator has no prime factor other than 2 and 5; false otherwise.
    /// </summary>
    public static bool TryFormat(Rational r, out string text)
    {
        text = "";
        var den = r.Denominator;
        int twos = 0, fives = 0;
        while (den.IsEven) { den /= 2; twos++; }
        while ((den % 5).IsZero) { den /= 5; fives++; }
        if (!den.IsOne) return false;
        int scale = Math.Max(twos, fives);
        var scaled = BigInteger.Abs(r.Numerator) * BigInteger.Pow(10, scale) / r.Denominator;
        var digits = scaled.ToString(System.Globalization.CultureInfo.InvariantCulture).PadLeft(scale + 1, '0');
        var sign = r.Sign < 0 ? "-" : "";
        text = scale == 0 ? sign + digits : $"{sign}{digits[..^scale]}.{digits[^scale..]}";
        return true;
    }
}
