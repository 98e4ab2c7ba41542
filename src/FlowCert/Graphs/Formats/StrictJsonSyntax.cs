namespace FlowCert.Graphs.Formats;

/// <summary>
/// Checks that a text is one JSON value as RFC 8259 ("The JavaScript Object Notation (JSON) Data
/// Interchange Format", DOI 10.17487/RFC8259, identifier from memory) defines it, before Json.NET (which is lenient) reads it:
/// no single quotes, unquoted keys, trailing commas, comments, NaN or other bare words, no control
/// characters outside strings (NUL included) or unescaped inside them. The first problem is a
/// <see cref="GraphFormatException"/> with its line and column. Iterative, so nesting depth costs no stack.
/// </summary>
internal static class StrictJsonSyntax
{
    private enum Expect { Value, ValueOrClose, KeyOrClose, Key, Colon, CommaOrClose, End }

    public static void Check(string text, string fileName)
    {
        int i = 0, line = 1, lineStart = 0;
        var stack = new Stack<char>();   // '{' or '['
        var opened = new Stack<(int Line, int Column)>();
        var expect = Expect.Value;
        GraphFormatException Error(int at, string problem) => new(fileName, line, at - lineStart + 1, problem);

        if (text.Length == 0) throw new GraphFormatException(fileName, 1, 1, "the file is empty: a JSON value was expected");
        while (true)
        {
            // white space: space, tab, line feed, carriage return
            while (i < text.Length && text[i] is ' ' or '\t' or '\n' or '\r')
            {
                if (text[i] == '\n') { line++; lineStart = i + 1; }
                i++;
            }
            if (i == text.Length)
            {
                if (expect == Expect.End) return;
                if (stack.Count == 0 && expect == Expect.Value)
                    throw Error(i, "the file holds only white space: a JSON value was expected");
                if (stack.Count == 0) throw Error(i, "the text ends where a value was expected");
                var (l, col) = opened.Peek();
                throw new GraphFormatException(fileName, l, col, $"the text ends before the {(stack.Peek() == '{' ? "object" : "array")} opened here is closed");
            }
            char c = text[i];
            if (c == '/' && i + 1 < text.Length && text[i + 1] is '/' or '*') throw Error(i, "comments are not JSON");
            if (c == '\0') throw Error(i, "a NUL character (\\u0000) is not JSON");
            if (char.IsControl(c)) throw Error(i, $"the control character \\u{(int)c:x4} is not JSON outside a string");
            if (c == '\'') throw Error(i, "single quotes are not JSON: strings and keys are written in double quotes");
            switch (expect)
            {
                case Expect.End:
                    throw Error(i, "text after the JSON value");
                case Expect.Colon:
                    if (c != ':') throw Error(i, $"':' expected after the key, found {Shown(text, i)}");
                    i++;
                    expect = Expect.Value;
                    continue;
                case Expect.CommaOrClose:
                    if (c == ',')
                    {
                        i++;
                        expect = stack.Peek() == '{' ? Expect.Key : Expect.Value;
                        continue;
                    }
                    if (c == (stack.Peek() == '{' ? '}' : ']')) { i++; Close(); continue; }
                    throw Error(i, $"',' or '{(stack.Peek() == '{' ? '}' : ']')}' expected, found {Shown(text, i)}");
                case Expect.Key:
                case Expect.KeyOrClose:
                    if (c == '}')
                    {
                        if (expect == Expect.Key) throw Error(i, "a trailing comma before '}' is not JSON");
                        i++;
                        Close();
                        continue;
                    }
                    if (c != '"') throw Error(i, $"object keys are strings in double quotes, found {Shown(text, i)}");
                    i = String(i);
                    expect = Expect.Colon;
                    continue;
                default: // Value or ValueOrClose
                    if (c == ']' && expect == Expect.ValueOrClose) { i++; Close(); continue; }
                    if (c == ']' && stack.Count > 0 && stack.Peek() == '[') throw Error(i, "a trailing comma before ']' is not JSON");
                    if (c is '{' or '[')
                    {
                        stack.Push(c);
                        opened.Push((line, i - lineStart + 1));
                        i++;
                        expect = c == '{' ? Expect.KeyOrClose : Expect.ValueOrClose;
                        continue;
                    }
                    if (c == '"') i = String(i);
                    else if (c == '-' || char.IsAsciiDigit(c)) i = Number(i);
                    else if (Word(i, "true") || Word(i, "false") || Word(i, "null")) i += text[i] == 'f' ? 5 : 4;
                    else throw Error(i, $"a JSON value (object, array, string, number, true, false or null) was expected, found {Shown(text, i)}");
                    expect = stack.Count == 0 ? Expect.End : Expect.CommaOrClose;
                    continue;
            }
        }

        void Close()
        {
            stack.Pop();
            opened.Pop();
            expect = stack.Count == 0 ? Expect.End : Expect.CommaOrClose;
        }

        bool Word(int at, string word)
            => string.CompareOrdinal(text, at, word, 0, word.Length) == 0
               && (at + word.Length == text.Length || !char.IsAsciiLetterOrDigit(text[at + word.Length]));

        int String(int start)
        {
            int k = start + 1;
            while (true)
            {
                if (k == text.Length) throw Error(start, "a string is not closed");
                char ch = text[k];
                if (ch == '"') return k + 1;
                if (ch < 0x20) throw Error(k, $"the control character \\u{(int)ch:x4} must be escaped inside a string");
                if (ch == '\\')
                {
                    if (k + 1 == text.Length) throw Error(start, "a string is not closed");
                    char e = text[k + 1];
                    if (e == 'u')
                    {
                        for (int h = 2; h < 6; h++)
                            if (k + h >= text.Length || !char.IsAsciiHexDigit(text[k + h]))
                                throw Error(k, "\\u must be followed by four hexadecimal digits");
                        k += 6;
                        continue;
                    }
                    if (e is not ('"' or '\\' or '/' or 'b' or 'f' or 'n' or 'r' or 't'))
                        throw Error(k, $"unknown escape {Shown(text, k, 2)} in a string");
                    k += 2;
                    continue;
                }
                k++;
            }
        }

        int Number(int start)
        {
            int k = start;
            if (text[k] == '-') k++;
            if (k == text.Length || !char.IsAsciiDigit(text[k])) throw Error(start, "a number needs a digit after '-'");
            if (text[k] == '0' && k + 1 < text.Length && char.IsAsciiDigit(text[k + 1])) throw Error(start, "a number may not start with 0 followed by digits");
            while (k < text.Length && char.IsAsciiDigit(text[k])) k++;
            if (k < text.Length && text[k] == '.')
            {
                k++;
                if (k == text.Length || !char.IsAsciiDigit(text[k])) throw Error(start, "a number needs a digit after '.'");
                while (k < text.Length && char.IsAsciiDigit(text[k])) k++;
            }
            if (k < text.Length && text[k] is 'e' or 'E')
            {
                k++;
                if (k < text.Length && text[k] is '+' or '-') k++;
                if (k == text.Length || !char.IsAsciiDigit(text[k])) throw Error(start, "a number needs a digit in its exponent");
                while (k < text.Length && char.IsAsciiDigit(text[k])) k++;
            }
            if (k < text.Length && (char.IsAsciiLetter(text[k]) || text[k] == '.')) throw Error(start, $"not a JSON number: {Shown(text, start, k - start + 1)}");
            return k;
        }
    }

    // What stands at a position, for a message: the character (or a few), control characters escaped.
    private static string Shown(string text, int at, int length = 1)
        => $"'{Excerpt.Of(text.Substring(at, Math.Min(length, text.Length - at)))}'";
}
