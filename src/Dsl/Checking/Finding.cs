using System;
using System.Collections.Generic;
using System.Linq;
using Phaseward.Netlists;

namespace Phaseward.Checking;

/// <summary>One hazard found by a rule: where, what, with the figures behind it.</summary>
public sealed class Finding
{
    private static readonly IReadOnlyDictionary<string, string> NoProperties = new Dictionary<string, string>();

    /// <summary>A finding of <paramref name="rule"/> at <paramref name="location"/>; <paramref name="arguments"/> fill the rule's message holes (formatted with ToString).</summary>
    public Finding(RuleDescriptor rule, SourceSpan location, IReadOnlyList<object> arguments,
        IReadOnlyList<SourceSpan>? relatedLocations = null, IReadOnlyDictionary<string, string>? properties = null)
    {
        Rule = rule ?? throw new ArgumentNullException(nameof(rule));
        Location = location ?? throw new ArgumentNullException(nameof(location));
        Arguments = (arguments ?? throw new ArgumentNullException(nameof(arguments))).Select(a => a?.ToString() ?? string.Empty).ToArray();
        RelatedLocations = relatedLocations ?? Array.Empty<SourceSpan>();
        Properties = properties ?? NoProperties;
    }

    /// <summary>The rule entry (ID, title, message format) this finding belongs to.</summary>
    public RuleDescriptor Rule { get; }

    /// <summary>The rule ID, <c>PW</c> and four digits.</summary>
    public string RuleId => Rule.Id;

    /// <summary>The call the finding is reported at.</summary>
    public SourceSpan Location { get; }

    /// <summary>The message's arguments, already formatted (figures with their units).</summary>
    public IReadOnlyList<string> Arguments { get; }

    /// <summary>The rule's message with this finding's figures filled in.</summary>
    public string Message => Rule.FormatMessage(Arguments.Cast<object>().ToArray());

    /// <summary>Other calls involved (the other latch, the chain's first gate, the clock gate...).</summary>
    public IReadOnlyList<SourceSpan> RelatedLocations { get; }

    /// <summary>Machine-readable details for code fixes and reports.</summary>
    public IReadOnlyDictionary<string, string> Properties { get; }

    /// <inheritdoc/>
    public override string ToString() => $"{Location}: {Rule.DefaultSeverity.ToString().ToLowerInvariant()} {RuleId}: {Message}";
}
