namespace Phaseward.Configuration;

/// <summary>A <c>phaseward.</c> option whose value could not be used: the default applies (the analyzers report PW9004).</summary>
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

    /// <summary>What the option accepts, as a phrase: "a whole number from 1 to 10000".</summary>
    public string Expected { get; }

    /// <summary>The value used instead, as text.</summary>
    public string DefaultValue { get; }

    public override string ToString() => $"the value '{Value}' of option '{Key}' is not valid: expected {Expected}; the default ({DefaultValue}) is used";
}
