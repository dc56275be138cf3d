using System.Collections.Generic;
using Phaseward.Netlists;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// Something the elaborator reports about a design (PW9001..PW9003): the rule, where (with the call chain that led
/// there, like a device's span) and the message arguments.
/// </summary>
internal sealed class ElaborationIssue
{
    public ElaborationIssue(string ruleId, SourceSpan location, IReadOnlyList<string> arguments)
    {
        RuleId = ruleId;
        Location = location;
        Arguments = arguments;
    }

    public string RuleId { get; }

    public SourceSpan Location { get; }

    public IReadOnlyList<string> Arguments { get; }

    public override string ToString() => RuleId + " " + Location + ": " + string.Join(" | ", Arguments);
}
