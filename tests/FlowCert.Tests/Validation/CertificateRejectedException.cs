namespace FlowCert.Tests.Validation;

/// <summary>A certificate that does not prove what it claims; the message says why.</summary>
public sealed class CertificateRejectedException(string message) : Exception(message);
