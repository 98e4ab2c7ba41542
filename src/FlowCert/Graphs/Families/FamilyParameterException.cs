namespace FlowCert.Graphs.Families;

/// <summary>A family asked for with parameters it cannot take: names the family and the parameter.</summary>
public sealed class FamilyParameterException(string message) : Exception(message);
