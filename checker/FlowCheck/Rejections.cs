namespace FlowCheck;

/// <summary>The certificate was read but a claim in it is false or malformed (exit code 1).</summary>
public sealed class InvalidCertificate(string message) : Exception(message);

/// <summary>An input could not be read at all: missing file, not JSON, bad graph file (exit code 2).</summary>
public sealed class UnreadableInput(string message) : Exception(message);
