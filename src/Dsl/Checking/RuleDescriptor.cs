using System;
using System.Globalization;
using System.Linq;

namespace Phaseward.Checking;

/// <summary>What a rule reports: its ID, fixed title, message format (figures come in as arguments) and default severity.</summary>
public sealed class RuleDescriptor
{
    public const string HelpBaseUri = "https://github.com/phaseward/phaseward/blob/main/docs/rules/";

    public RuleDescriptor(string id, RuleFamily family, Severity defaultSeverity, string title, string messageFormat, string description)
    {
        Id = id ?? throw new ArgumentNullException(nameof(id));
        if (id.Length != 6 || !id.StartsWith("PW", StringComparison.Ordinal) || id[2] - '0' != (int)family || !id.Substring(2).All(char.IsDigit))
            throw new ArgumentException($"Rule ID '{id}' must be PW followed by four digits, the first being its family's ({family} = {(int)family}).", nameof(id));
        Family = family;
        DefaultSeverity = defaultSeverity;
        Title = title ?? throw new ArgumentNullException(nameof(title));
        MessageFormat = messageFormat ?? throw new ArgumentNullException(nameof(messageFormat));
        Description = description ?? throw new ArgumentNullException(nameof(description));
    }

    public string Id { get; }

    public RuleFamily Family { get; }

    public string Title { get; }

    /// <summary>A composite format string; <see cref="Finding.Arguments"/> fill its holes.</summary>
    public string MessageFormat { get; }

    /// <summary>The diagnostic category: the family's name under "Phaseward.".</summary>
    public string Category => "Phaseward." + Family;

    public Severity DefaultSeverity { get; }

    public string Description { get; }

    /// <summary>The rule's page under docs/rules/.</summary>
    public string HelpUri => HelpBaseUri + Id + ".md";

    public string FormatMessage(params object[] arguments) => string.Format(CultureInfo.InvariantCulture, MessageFormat, arguments);

    public override string ToString() => Id + ": " + Title;
}
