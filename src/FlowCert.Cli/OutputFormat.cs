namespace FlowCert.Cli;

/// <summary><c>--format NAME</c> is how every command chooses its output; <c>--json</c> stays as the older spelling of <c>--format json</c>.</summary>
public static class OutputFormat
{
    /// <summary>
    /// The format asked for: <c>--format</c>'s value, or json for <c>--json</c> (which may stand beside
    /// <c>--format json</c> or the default text, not beside another format).
    /// </summary>
    public static string Chosen(string format, bool jsonFlag)
    {
        if (!jsonFlag) return format;
        if (format is "json" or "text") return "json";
        throw new UserInputException($"--json and --format {Escaped.Of(format)} disagree: give one");
    }

    /// <summary>For commands with a text and a JSON layout: true for json, false for text; anything else is refused.</summary>
    public static bool IsJson(string format, bool jsonFlag, string command = "solve") => Chosen(format, jsonFlag) switch
    {
        "json" => true,
        "text" => false,
        var other => throw new UserInputException($"'{Escaped.Of(other)}' is not an output format of {command}: write text or json."),
    };

    /// <summary>The <c>--format text|json</c> option of such a command.</summary>
    public static System.CommandLine.Option<string> TextOrJson(string text)
        => new("--format") { Description = $"text ({text}) or json (one JSON object)", DefaultValueFactory = _ => "text" };
}
