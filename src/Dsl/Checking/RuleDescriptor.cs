using System;
using System.Globalization;
using System.Linq;

namespace Phaseward.Checking;

/// <summary>What a rule reports: its ID, fixed title, message format (figures come in as arguments) and default severity.</summary>
public sealed class RuleDescriptor
{
    /// <summary>Where the rule pages live; a rule's page is this plus its ID and <c>.md</c>.</summary>
    public const string HelpBaseUri = "https://github.com/phaseward/phaseward/blob/main/docs/rules/";

    /// <summary>A registry entry: ID, family, default severity, fixed title, message format with <c>{0}</c> holes, description.</summary>
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

    /// <summary>The rule ID, <c>PW</c> and four digits; the first digit is the family.</summary>
    public string Id { get; }

    /// <summary>The family, which is also the diagnostic category.</summary>
    public RuleFamily Family { get; }

    /// <summary>The fixed title (figures go in the message).</summary>
    public string Title { get; }

    /// <summary>A composite format string; <see cref="Finding.Arguments"/> fill its holes.</summary>
    public string MessageFormat { get; }

    /// <summary>The diagnostic category: the family's name under "Phaseward.".</summary>
    public string Category => "Phaseward." + Family;

    /// <summary>The severity when no configuration changes it.</summary>
    public Severity DefaultSeverity { get; }

    /// <summary>What the rule finds and why it matters, in a few sentences.</summary>
    public string Description { get; }

    /// <summary>The rule's page under docs/rules/.</summary>
    public string HelpUri => HelpBaseUri + Id + ".md";

    /// <summary>The message format filled with <paramref name="arguments"/> (invariant culture).</summary>
    public string FormatMessage(params object[] arguments) => string.Format(CultureInfo.InvariantCulture, MessageFormat, arguments);

    /// <inheritdoc/>
    public override string ToString() => Id + ": " + Title;
}
