using System.CommandLine;
using System.Globalization;

namespace FlowCert.Cli;

/// <summary>
/// <c>--seed N</c>: a whole number from 0 to 2^64 - 1. Anything else is refused in those words (the
/// default parser's message names a .NET type, which tells a user nothing).
/// </summary>
public sealed class SeedOption : Option<ulong>
{
    /// <summary>The option with its description; <paramref name="defaultSeed"/> when it is not given.</summary>
    public SeedOption(string description, ulong defaultSeed) : base("--seed")
    {
        Description = description;
        DefaultValueFactory = _ => defaultSeed;
        CustomParser = result =>
        {
            if (result.Tokens.Count == 0) return defaultSeed;
            var text = result.Tokens[0].Value;
            if (ulong.TryParse(text, NumberStyles.None, CultureInfo.InvariantCulture, out var seed)) return seed;
            result.AddError($"--seed takes a whole number from 0 to {ulong.MaxValue}, not '{Escaped.Of(text)}'");
            return defaultSeed;
        };
    }
}
