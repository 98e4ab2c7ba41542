using System.Text;

namespace FlowCert.Tests.Fuzz;

/// <summary>
/// Seeded mutations of a valid input, as fuzzers of file readers use them (common practice): flip a
/// character, truncate, duplicate or delete a slice, insert a huge or malformed number, deep nesting, or
/// a control character. One to three mutations per input; the same seed gives the same inputs.
/// </summary>
public sealed class Mutator(int seed)
{
    private readonly Random rng = new(seed);

    private static readonly string[] Numbers =
    [
        "99999999999999999999999999999999", "9223372036854775807", "9223372036854775808", "-9223372036854775809",
        "18446744073709551616", "2147483648", "4294967296", "1e5000", "1e-5000", "-0", "0/0", "1/0", "NaN",
        "Infinity", "0x10", "1.5e3", "00000000000000000000001", "-", "/", ".", "1/99999999999999999999999",
    ];

    private static readonly string[] Controls = ["\0", "\r", "\n", "\t", "\u001b", "\u0007", "\u007f", "\u0085", "\u2028", "\ufeff", "\ud800", "\udfff", "\uffff"];

    private static readonly string[] Fragments = ["\"", "'", "{", "}", "[", "]", ",", ":", " ", "#", "//", "/*", "\\", "\\u", "%%", "edge", "node", "input", "~", "?", "~~"];

    /// <summary>A mutation of <paramref name="text"/>.</summary>
    public string Mutate(string text)
    {
        var s = new StringBuilder(text);
        int count = 1 + rng.Next(3);
        for (int k = 0; k < count; k++) MutateOnce(s);
        return s.ToString();
    }

    private int At(StringBuilder s) => rng.Next(s.Length + 1);

    private void MutateOnce(StringBuilder s)
    {
        switch (rng.Next(9))
        {
            case 0: // flip one character to any byte value
                if (s.Length > 0) s[rng.Next(s.Length)] = (char)rng.Next(256);
                break;
            case 1: // truncate
                s.Length = At(s);
                break;
            case 2: // duplicate a slice
                if (s.Length > 0)
                {
                    int a = rng.Next(s.Length), b = Math.Min(s.Length, a + 1 + rng.Next(64));
                    s.Insert(At(s), s.ToString(a, b - a));
                }
                break;
            case 3: // delete a slice
                if (s.Length > 0)
                {
                    int a = rng.Next(s.Length);
                    s.Remove(a, Math.Min(s.Length - a, 1 + rng.Next(16)));
                }
                break;
            case 4: // a huge or malformed number, replacing a digit run when there is one
                ReplaceNumber(s, Numbers[rng.Next(Numbers.Length)]);
                break;
            case 5: // deep nesting
                int depth = 1 + rng.Next(rng.Next(2) == 0 ? 100 : 20000);
                s.Insert(At(s), rng.Next(2) == 0 ? new string('[', depth) : string.Concat(Enumerable.Repeat("{\"a\":", depth)));
                break;
            case 6: // control characters
                s.Insert(At(s), Controls[rng.Next(Controls.Length)]);
                break;
            case 7: // a structural fragment
                s.Insert(At(s), Fragments[rng.Next(Fragments.Length)]);
                break;
            default: // swap a line with the one after it, or repeat a line
                var lines = s.ToString().Split('\n').ToList();
                int i = rng.Next(lines.Count);
                if (rng.Next(2) == 0 && i + 1 < lines.Count) (lines[i], lines[i + 1]) = (lines[i + 1], lines[i]);
                else lines.Insert(i, lines[i]);
                s.Clear().Append(string.Join('\n', lines));
                break;
        }
    }

    private void ReplaceNumber(StringBuilder s, string number)
    {
        var digits = Enumerable.Range(0, s.Length).Where(i => char.IsAsciiDigit(s[i]) && (i == 0 || !char.IsAsciiDigit(s[i - 1]))).ToList();
        if (digits.Count == 0) { s.Insert(At(s), number); return; }
        int start = digits[rng.Next(digits.Count)], end = start;
        while (end < s.Length && char.IsAsciiDigit(s[end])) end++;
        s.Remove(start, end - start).Insert(start, number);
    }
}
