using System.Numerics;
using Newtonsoft.Json;
using Newtonsoft.Json.Linq;

namespace FlowCheck;

/// <summary>Loads the certificate text and reads JSON values of exactly the expected shape.</summary>
public static class Json
{
    /// <summary>Parses one JSON document: no duplicate keys, no trailing content, numbers exact.</summary>
    public static JToken Load(string path)
    {
        string text;
        try { text = File.ReadAllText(path); }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        { throw new UnreadableInput($"{path}: {e.Message}"); }
        try
        {
            using var reader = new JsonTextReader(new StringReader(text))
            { DateParseHandling = DateParseHandling.None, FloatParseHandling = FloatParseHandling.Decimal };
            var settings = new JsonLoadSettings { DuplicatePropertyNameHandling = DuplicatePropertyNameHandling.Error };
            var token = JToken.ReadFrom(reader, settings);
            if (reader.Read()) throw new UnreadableInput($"{path}: content after the JSON value");
            return token;
        }
        catch (JsonReaderException e) { throw new UnreadableInput($"{path}: not JSON: {e.Message}"); }
    }

    /// <summary>An object whose keys are all among <paramref name="known"/>.</summary>
    public static JObject Object(JToken? token, string what, params string[] known)
    {
        if (token is not JObject o) throw Shape(token, what, "an object");
        foreach (var p in o.Properties())
            if (!known.Contains(p.Name)) throw new InvalidCertificate($"unknown key \"{p.Name}\" in {what}");
        return o;
    }

    /// <summary>An object keyed by node names, keys sorted ordinally and unique.</summary>
    public static JObject NodeMap(JToken? token, string what)
    {
        if (token is not JObject o) throw Shape(token, what, "an object");
        SortedUnique(o.Properties().Select(p => p.Name).ToList(), what);
        return o;
    }

    public static JArray Array(JToken? token, string what) => token as JArray ?? throw Shape(token, what, "an array");

    public static string String(JToken? token, string what) =>
        token?.Type == JTokenType.String ? (string)token! : throw Shape(token, what, "a string");

    /// <summary>At most 80 characters of a value from the input, then "...": a message never repeats a long value whole.</summary>
    public static string Cut(string s) => s.Length <= 80 ? s : s[..80] + "...";

    public static List<string> Strings(JToken? token, string what) =>
        Array(token, what).Select((t, i) => String(t, $"{what}[{i}]")).ToList();

    public static BigInteger Integer(JToken? token, string what) =>
        token?.Type == JTokenType.Integer ? BigInteger.Parse(token.ToString()) : throw Shape(token, what, "an integer");

    /// <summary>Requires strictly increasing ordinal order: sorted and free of duplicates.</summary>
    public static void SortedUnique(List<string> names, string what)
    {
        for (var i = 1; i < names.Count; i++)
            if (string.CompareOrdinal(names[i - 1], names[i]) >= 0)
                throw new InvalidCertificate($"{what}: \"{names[i]}\" after \"{names[i - 1]}\" (must be sorted, no duplicates)");
    }

    static InvalidCertificate Shape(JToken? token, string what, string expected) =>
        new(token is null ? $"missing {what}" : $"{what} must be {expected}, found {token.Type.ToString().ToLowerInvariant()}");
}
