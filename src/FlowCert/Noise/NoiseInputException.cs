namespace FlowCert.Noise;

/// <summary>A certificate the noise model does not apply to (another field, no flow, phases on outputs); exit 2 in the CLI.</summary>
public sealed class NoiseInputException(string message) : Exception(message);
