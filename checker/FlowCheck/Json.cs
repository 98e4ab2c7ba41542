using System.Buffers;
using System.Numerics;
using System.Text;

namespace FlowCheck;

/// <summary>A strict RFC 8259 JSON reader over a file read in 64 KiB chunks, never the whole text at once.
/// <see cref="Validate"/> reads the document once (syntax, UTF-8, duplicate keys, nothing after the value)
/// and remembers where the members of the top object (and of its "graph", "producer" and "obstruction"
/// objects) start; the typed readers then seek there and read values of exactly the expected shape.</summary>
public sealed class Json : IDisposable
{
    static readonly UTF8Encoding Utf8 = new(false, true);
    static readonly string[] Nested = ["graph", "producer", "obstruction"];
    static readonly SearchValues<byte> Special = SearchValues.Create([(byte)'"', (byte)'\\', .. Enumerable.Range(0, 32).Select(b => (byte)b)]);
    readonly List<(HashSet<string> Set, List<string> Sorted)> keySets = []; // the keys of the open objects, one per depth
    readonly Stream stream;
    readonly string path;
    readonly Progress progress;
    readonly byte[] buffer = new byte[1 << 16];
    readonly MemoryStream slow = new(); // the bytes of a string read by the slow path (escapes, or across a chunk)
    int length, pos, line = 1, column = 1;

    /// <summary>Where each remembered member value starts, by container ("" for the top object, or "graph",
    /// "producer", "obstruction") and key.</summary>
    readonly Dictionary<(string, string), (long Offset, int Line, int Column)> members = [];

    public Json(string path, Progress progress)
    {
        (this.path, this.progress) = (path, progress);
        try { stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1, FileOptions.SequentialScan); }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException) { throw new UnreadableInput($"{path}: {e.Message}"); }
        if (!stream.CanSeek) { var copy = new MemoryStream(); stream.CopyTo(copy); stream.Dispose(); stream = copy; }
    }

    public void Dispose() => stream.Dispose();

    /// <summary>Reads the whole document once; throws <see cref="UnreadableInput"/> at the first fault, with line and column.</summary>
    public void Validate() { Seek((0, 1, 1)); Skip(0, ""); if (Kind(end: true) != "end") throw Syntax("content after the JSON value"); }

    /// <summary>Validates one value; the members of an object are remembered under <paramref name="container"/> unless it is null.</summary>
    void Skip(int depth, string? container)
    {
        if (depth > 64) throw Syntax("nesting deeper than 64 levels");
        switch (Kind())
        {
            case "object":
                while (keySets.Count <= depth) keySets.Add((new(StringComparer.Ordinal), []));
                var (keys, sorted) = keySets[depth]; keys.Clear(); sorted.Clear();
                foreach (var key in Object())
                {
                    // keys in increasing order cannot repeat: a set of the keys is built only once one is out of order
                    // Stryker disable once Equality: a run in decreasing order has no repeats either, and the set takes over after it
                    var ordered = keys.Count == 0 && (sorted.Count == 0 || string.CompareOrdinal(sorted[^1], key) < 0);
                    if (ordered) sorted.Add(key); else if (keys.Count == 0) keys.UnionWith(sorted);
                    if (!ordered && !keys.Add(key)) throw Syntax($"duplicate key \"{Cut(key)}\"");
                    if (container is not null) members[(container, key)] = (Position, line, column);
                    Skip(depth + 1, depth == 0 && Nested.Contains(key) ? key : null);
                }
                break;
            case "array": foreach (var _ in Array()) Skip(depth + 1, null); break;
            // Stryker disable once Boolean: keep only saves allocating the string, the validation is the same
            case "string": ReadString(keep: false); break;
            case "number": Number(); break;
            default: foreach (var c in Kind()) if (Peek() == c) Take(); else throw Syntax("misspelt literal (true, false or null)"); break;
        }
    }

    long Position => stream.Position - length + pos;

    bool Seek((long Offset, int Line, int Column) at) { (stream.Position, length, pos, line, column) = (at.Offset, 0, 0, at.Line, at.Column); return true; }

    int Peek() => pos < length ? buffer[pos] : Refill(); // small enough to be inlined

    int Refill()
    {
        (length, pos) = (stream.Read(buffer), 0);
        if (progress.Due) progress.Show($"reading: byte {stream.Position:N0} of {stream.Length:N0}");
        return length > 0 ? buffer[0] : -1;
    }

    int Take()
    {
        var b = Peek() is >= 0 and var next ? next : throw Syntax("unexpected end of the text");
        (pos, column) = (pos + 1, column + Width(b));
        return b;
    }

    /// <summary>A column is a character: 1 for a byte that starts one, 0 for a UTF-8 continuation byte.</summary>
    static int Width(int b) => (b & 0xC0) != 0x80 ? 1 : 0;

    /// <summary>Skips white space; returns the next byte (-1 at the end).</summary>
    int Space()
    {
        int b;
        for (; (b = Peek()) is ' ' or '\t' or '\n' or '\r'; pos++) (line, column) = b == '\n' ? (line + 1, 1) : (line, column + 1);
        return b;
    }

    UnreadableInput Syntax(string what) => new($"{path}:{line}:{column}: not JSON: {what}");

    /// <summary>Skips white space and names the next value's kind ("true", "false", "null" for literals; "number";
    /// "end" at the end of the text if <paramref name="end"/> allows it).</summary>
    string Kind(bool end = false) =>
        Space() switch
        {
            '{' => "object", '[' => "array", '"' => "string", 't' => "true", 'f' => "false", 'n' => "null",
            '-' or (>= '0' and <= '9') => "number", < 0 when end => "end", < 0 => throw Syntax("unexpected end of the text"),
            var b => throw Syntax(end ? "content after the JSON value" : b == 0 ? "NUL byte" : b < 0x80 ? $"unexpected character '{(char)b}'" : "unexpected byte"),
        };

    void Expect(char c) { if (Space() == c) Take(); else throw Syntax($"expected '{c}'"); }

    /// <summary>The members of an object: yields each key; the caller reads or skips its value before the next.</summary>
    IEnumerable<string> Object()
    {
        Expect('{');
        if (Space() == '}') { Take(); yield break; }
        do
        {
            if (Space() != '"') throw Syntax("expected a key in double quotes");
            var key = ReadString()!;
            Expect(':');
            yield return key;
        } while (Next('}'));
    }

    IEnumerable<int> Array()
    {
        Expect('[');
        if (Space() == ']') { Take(); yield break; }
        var i = 0;
        do yield return i++; while (Next(']'));
    }

    /// <summary>After a member or item: a comma (then another must follow) or the closing bracket.</summary>
    bool Next(char close) => (Space() is var next && (next == ',' || next == close) ? Take() : throw Syntax($"expected ',' or '{close}'")) == ',';

    /// <summary>A string; the usual case, a string without escapes inside the buffer, is decoded in place.
    /// Without <paramref name="keep"/> it is only validated (null is returned).</summary>
    string? ReadString(bool keep = true)
    {
        Take();
        var rest = buffer.AsSpan(pos, length - pos);
        var end = rest.IndexOfAny(Special);
        // Stryker disable once Equality: an empty string (end 0) read by the slow path below gives the same result
        if (end >= 0 && rest[end] == '"')
        {
            var text = rest[..end];
            if (!System.Text.Unicode.Utf8.IsValid(text)) throw Syntax("a string that is not UTF-8");
            pos += end + 1;
            foreach (var b in text) column += Width(b);
            column++;
            // Stryker disable once Conditional: keep only saves allocating the string, the validation is the same
            return keep ? Utf8.GetString(text) : null;
        }
        slow.SetLength(0);
        Span<byte> encoded = stackalloc byte[4];
        for (var b = Peek(); b != '"'; b = Peek())
        {
            if (b is >= 0 and < 0x20) throw Syntax("control character in a string (write it as an escape)");
            Take();
            if (b != '\\') { slow.WriteByte((byte)b); continue; }
            var e = Peek();
            int c = e switch { '"' => '"', '\\' => '\\', '/' => '/', 'b' => '\b', 'f' => '\f', 'n' => '\n', 'r' => '\r', 't' => '\t', 'u' => 0, _ => -1 };
            if (c < 0) throw Syntax("unknown escape");
            Take();
            if (e == 'u') c = Hex4();
            if (c is >= 0xDC00 and < 0xE000) throw Syntax("lone low surrogate");
            if (c is >= 0xD800 and < 0xDC00)
            {
                var low = Take() == '\\' && Take() == 'u' ? Hex4() : 0;
                if (low is < 0xDC00 or >= 0xE000) throw Syntax("lone high surrogate");
                c = 0x10000 + ((c - 0xD800) << 10) + (low - 0xDC00);
            }
            slow.Write(encoded[..new Rune(c).EncodeToUtf8(encoded)]);
        }
        Take();
        try { return Utf8.GetString(slow.GetBuffer(), 0, (int)slow.Length); }
        catch (DecoderFallbackException) { throw Syntax("a string that is not UTF-8"); }
    }

    int Hex4()
    {
        var v = 0;
        for (var i = 0; i < 4; i++)
            v = v * 16 + (Take() switch { var b and >= '0' and <= '9' => b - '0', var b and >= 'a' and <= 'f' => b - 'a' + 10,
                var b and >= 'A' and <= 'F' => b - 'A' + 10, _ => throw Syntax("\\u needs four hex digits") });
        return v;
    }

    /// <summary>A number: -?(0|[1-9][0-9]*)(.[0-9]+)?([eE][+-]?[0-9]+)?; returns its text and whether it is an integer.</summary>
    (string Text, bool Integer) Number()
    {
        var text = new StringBuilder();
        void Digits() { if (Peek() is < '0' or > '9') throw Syntax("a digit must follow"); while (Peek() is >= '0' and <= '9') text.Append((char)Take()); }
        if (Peek() == '-') text.Append((char)Take());
        if (Peek() == '0') text.Append((char)Take()); else Digits();
        var integer = true;
        if (Peek() == '.') { text.Append((char)Take()); Digits(); integer = false; }
        if (Peek() is not ('e' or 'E')) return (text.ToString(), integer);
        text.Append((char)Take());
        if (Peek() is '+' or '-') text.Append((char)Take());
        Digits();
        return (text.ToString(), false);
    }

    // ---- typed reading, after Validate: a wrong shape is a verdict (InvalidCertificate), not a syntax error ----

    /// <summary>Moves to a member's value (container "" is the top object); false when the member is absent.</summary>
    public bool Find(string container, string key) => members.TryGetValue((container, key), out var at) && Seek(at);

    /// <summary>Moves to a member that must be present.</summary>
    public Json At(string container, string key, string what) =>
        Find(container, key) ? this : throw new InvalidCertificate($"missing {what}");

    /// <summary>Requires the top object (container "") or a remembered member object whose keys are all known.</summary>
    public void Known(string container, string what, params string[] known)
    {
        if (container == "") Seek((0, 1, 1));
        else At("", container, what);
        Expecting("object", what, "an object");
        foreach (var (_, key) in members.Keys.Where(m => m.Item1 == container && !known.Contains(m.Item2)))
            throw new InvalidCertificate($"unknown key \"{Cut(key)}\" in {what}");
    }

    /// <summary>Requires the next value's kind; the message names <paramref name="what"/> with ".key" or "[index]" if given
    /// (composed only for the message: most values are read without one).</summary>
    void Expecting(string kind, string what, string expected, string? key = null, int index = -1, int outer = -1)
    {
        var found = Kind();
        if (found == kind) return;
        if (key is not null) what = $"{what}.{Cut(key)}";
        if (outer >= 0) what = $"{what}[{outer}]";
        if (index >= 0) what = $"{what}[{index}]";
        if (found == "number") found = Number().Integer ? "integer" : "float";
        if (found is "true" or "false") found = "boolean";
        throw new InvalidCertificate($"{what} must be {expected}, found {found}");
    }

    public string String(string what, string? key = null, int index = -1, int outer = -1) { Expecting("string", what, "a string", key, index, outer); return ReadString()!; }

    public BigInteger Integer(string what) { Expecting("number", what, "an integer");
        return Number() is (var text, true) ? BigInteger.Parse(text) : throw new InvalidCertificate($"{what} must be an integer, found float"); }

    /// <summary>Items of an array; the caller reads each item before asking for the next.</summary>
    public IEnumerable<int> Items(string what, int index = -1) { Expecting("array", what, "an array", null, index); return Array(); }

    /// <summary>An array of strings; <paramref name="index"/>, when given, says the array is item [index] of <paramref name="what"/>.</summary>
    public List<string> Strings(string what, int index = -1)
    {
        var items = new List<string>();
        foreach (var i in Items(what, index)) items.Add(String(what, null, i, index));
        return items;
    }

    /// <summary>The keys of an object (the caller reads each value), and a boolean.</summary>
    public IEnumerable<string> Members(string what) { Expecting("object", what, "an object"); return Object(); }
    public bool Boolean(string what) { var k = Kind(); if (k is not ("true" or "false")) Expecting("boolean", what, "true or false"); foreach (var _ in k) Take(); return k == "true"; }

    /// <summary>Keys of an object keyed by node names, required strictly increasing (sorted, no duplicates).</summary>
    public IEnumerable<string> NodeMap(string what, string? owner = null)
    {
        Expecting("object", what, "an object", owner);
        if (owner is not null) what = $"{what}.{owner}";
        string? before = null;
        foreach (var key in Object())
        {
            // Stryker disable once Equality: equal keys cannot get here, Validate refuses a duplicate key
            if (before is not null && string.CompareOrdinal(before, key) >= 0) throw Unsorted(what, key, before);
            yield return before = key;
        }
    }

    /// <summary>Requires strictly increasing ordinal order: sorted and free of duplicates.</summary>
    public static void SortedUnique(List<string> names, string what)
    {
        for (var i = 1; i < names.Count; i++) if (string.CompareOrdinal(names[i - 1], names[i]) >= 0) throw Unsorted(what, names[i], names[i - 1]);
    }

    static InvalidCertificate Unsorted(string what, string name, string before) =>
        new($"{what}: \"{Cut(name)}\" after \"{Cut(before)}\" (must be sorted, no duplicates)");

    /// <summary>At most 80 characters of a value from the input, then "...": a message never repeats a long value whole.</summary>
    public static string Cut(string s) => s.Length <= 80 ? s : s[..80] + "...";
}
