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

    /// <summary>For solve: true for json, false for text; anything else is refused.</summary>
    public static bool IsJson(string format, bool jsonFlag) => Chosen(format, jsonFlag) switch
    {
        "json" => true,
        "text" => false,
        var other => throw new UserInputException($"'{other}' is not an output format of solve: write text or json."),
    };
}
