using System.CommandLine;

namespace FlowCert.Cli;

/// <summary>
/// The certificate is a positional argument in every command that reads one (schedule CERT, draw GRAPH
/// [CERT], simulate GRAPH CERT, as in flowcheck CERT); draw and simulate still take the older
/// <c>--cert CERT</c> as an alias.
/// </summary>
public static class CertificateArgument
{
    /// <summary>The optional positional CERT.</summary>
    public static PathArgument Positional(string description) => new("CERT") { Description = description, Arity = ArgumentArity.ZeroOrOne };

    /// <summary>The older spelling <c>--cert CERT</c>.</summary>
    public static PathOption Option() => new("--cert") { Description = "the certificate, as CERT (the older spelling)" };

    /// <summary>The certificate given either way; refuses two different ones.</summary>
    public static string? Resolve(string? positional, string? option)
    {
        if (positional is not null && option is not null && positional != option)
            throw new UserInputException($"two certificates given ({positional} and --cert {option}): give one, as CERT");
        return positional ?? option;
    }
}
