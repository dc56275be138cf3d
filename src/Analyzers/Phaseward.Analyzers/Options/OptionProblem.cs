namespace Phaseward.Analyzers.Options;

/// <summary>An option whose value could not be used (reported as PW9004; the default applies).</summary>
internal sealed class OptionProblem
{
    public OptionProblem(string key, string value, string expected, string defaultValue)
    {
        Key = key;
        Value = value;
        Expected = expected;
        DefaultValue = defaultValue;
    }

    public string Key { get; }

    public string Value { get; }

    public string Expected { get; }

    public string DefaultValue { get; }
}
