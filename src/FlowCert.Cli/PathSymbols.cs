using System.CommandLine;
using System.CommandLine.Parsing;

namespace FlowCert.Cli;

/// <summary>An argument that names a file or folder. <see cref="PathSymbols.RefuseEmpty"/> refuses it empty.</summary>
public sealed class PathArgument(string name) : Argument<string>(name);

/// <summary>An option that names a file or folder. <see cref="PathSymbols.RefuseEmpty"/> refuses it empty.</summary>
public sealed class PathOption(string name) : Option<string?>(name);

/// <summary>
/// The one check of every file and folder name a command is given: an empty one is a user error (exit 2)
/// named after its argument or option, before the command runs (the file APIs would throw an
/// ArgumentException, reported as an internal error).
/// </summary>
public static class PathSymbols
{
    /// <summary>Throws <see cref="UserInputException"/> for the first path argument or option of the parsed command given as "".</summary>
    public static void RefuseEmpty(ParseResult parsed)
    {
        var command = parsed.CommandResult.Command;
        // Look only at what was typed: asking for the value of a required symbol that is absent (as with
        // --help) would throw.
        foreach (var argument in command.Arguments.OfType<PathArgument>())
            if (parsed.GetResult(argument) is { Tokens: [{ Value: "" }, ..] }) throw Empty(argument.Name);
        foreach (var option in command.Options.OfType<PathOption>())
            if (parsed.GetResult(option) is { Tokens: [{ Value: "" }, ..] }) throw Empty(option.Name);
    }

    private static UserInputException Empty(string name) => new($"{name} is empty: give a file or folder name.");
}
