using System.Globalization;

namespace FlowCert.Tests.Validation;

/// <summary>
/// FLOWCERT_VALIDATION_SCALE (a positive integer, default 1) multiplies the sample sizes of the seeded
/// validation runs; docs/validation.md says what each run covers at scale 1 and 10.
/// </summary>
public static class ValidationScale
{
    public static int Factor
    {
        get
        {
            var text = Environment.GetEnvironmentVariable("FLOWCERT_VALIDATION_SCALE");
            if (string.IsNullOrWhiteSpace(text)) return 1;
            if (!int.TryParse(text, NumberStyles.None, CultureInfo.InvariantCulture, out var k) || k < 1)
                throw new InvalidOperationException($"FLOWCERT_VALIDATION_SCALE must be a positive integer, not '{text}'");
            return k;
        }
    }
}
