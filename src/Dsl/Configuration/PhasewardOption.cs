using System;
using System.Collections.Generic;

namespace Phaseward.Configuration;

/// <summary>
/// One <c>phaseward.</c> key of .editorconfig / .globalconfig: its name, what it accepts and its default. The typed
/// definitions are in <see cref="OptionCatalog"/>; the analyzers and the report tool both read through them.
/// </summary>
internal abstract class PhasewardOption
{
    protected PhasewardOption(string key, string expected, string defaultText)
    {
        Key = key;
        Expected = expected;
        DefaultText = defaultText;
    }

    /// <summary>The full key, lower case, as written in the config file: <c>phaseward.min_race_margin</c>.</summary>
    public string Key { get; }

    /// <summary>What the key accepts, as a phrase for messages.</summary>
    public string Expected { get; }

    /// <summary>The default as text ("computed by the rule" when the rule derives its own).</summary>
    public string DefaultText { get; }

    /// <summary>Null when <paramref name="text"/> is a usable value, else the problem (naming the key, the value and the expected format).</summary>
    public abstract OptionProblem? Check(string text);
}

/// <summary>A <c>phaseward.</c> key whose value reads as a <typeparamref name="T"/>.</summary>
internal sealed class PhasewardOption<T> : PhasewardOption
{
    private readonly Func<string, (bool Ok, T Value)> parse;

    public PhasewardOption(string key, T defaultValue, string expected, string defaultText, Func<string, (bool Ok, T Value)> parse)
        : base(key, expected, defaultText)
    {
        Default = defaultValue;
        this.parse = parse;
    }

    public T Default { get; }

    /// <summary>Reads the value of <paramref name="text"/>; false for anything this key does not accept.</summary>
    public bool TryParse(string text, out T value)
    {
        var (ok, parsed) = parse(text);
        value = ok ? parsed : Default;
        return ok;
    }

    public override OptionProblem? Check(string text) => TryParse(text, out _) ? null : ProblemWith(text);

    /// <summary>
    /// The value of this key from <paramref name="lookup"/> (null when the key is absent): the default when absent, and
    /// the default with a problem recorded when the value cannot be used.
    /// </summary>
    public T Read(Func<string, string?> lookup, ICollection<OptionProblem> problems)
    {
        if (lookup(Key) is not { } text)
            return Default;
        if (TryParse(text, out var value))
            return value;
        problems.Add(ProblemWith(text));
        return Default;
    }

    private OptionProblem ProblemWith(string text) => new(Key, text, Expected, DefaultText);
}
