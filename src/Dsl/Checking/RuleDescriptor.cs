using System;
using System.Globalization;

namespace Phaseward.Checking;

/// <summary>What a rule reports: its ID, fixed title, message format (figures come in as arguments) and default severity.</summary>
public sealed class RuleDescriptor
{
    public const string HelpBaseUri = "https://github.com/phaseward/phaseward/blob/main/docs/rules/";

    public RuleDescriptor(string id, string title, string messageFormat, string category, Severity defaultSeverity, string description)
    {
        Id = id ?? throw new ArgumentNullException(nameof(id));
        Title = title ?? throw new ArgumentNullException(nameof(title));
        MessageFormat = messageFormat ?? throw new ArgumentNullException(nameof(messageFormat));
        Category = category ?? throw new ArgumentNullException(nameof(category));
        DefaultSeverity = defaultSeverity;
        Description = description ?? throw new ArgumentNullException(nameof(description));
    }

    public string Id { get; }

    public string Title { get; }

    /// <summary>A composite format string; <see cref="Finding.Arguments"/> fill its holes.</summary>
    public string MessageFormat { get; }

    public string Category { get; }

    public Severity DefaultSeverity { get; }

    public string Description { get; }

    /// <summary>The rule's page under docs/rules/.</summary>
    public string HelpUri => HelpBaseUri + Id + ".md";

    public string FormatMessage(params object[] arguments) => string.Format(CultureInfo.InvariantCulture, MessageFormat, arguments);

    public override string ToString() => Id + ": " + Title;
}
