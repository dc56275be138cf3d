using System;
using System.Collections.Generic;
using Phaseward.Checking;
using Phaseward.Configuration;

namespace Phaseward.Cli.Policy;

/// <summary>
/// Everything that decides what the report shows, in the compiler's order: the analyzer config of each source file
/// (severities and <c>phaseward.</c> options, through their one definition in <see cref="OptionCatalog"/>), the
/// project's warning switches, then the command line, which wins.
/// </summary>
internal sealed class ReportPolicy
{
    private readonly Dictionary<string, ReportSeverity> severityOverrides = new(StringComparer.OrdinalIgnoreCase);
    private readonly Dictionary<string, string> optionOverrides = new(StringComparer.OrdinalIgnoreCase);

    public ReportPolicy(ReportConfiguration? configuration = null, BuildWarningOptions? build = null)
    {
        Configuration = configuration ?? ReportConfiguration.None;
        Build = build ?? BuildWarningOptions.None;
    }

    public ReportConfiguration Configuration { get; }

    public BuildWarningOptions Build { get; }

    /// <summary>A rule's severity from the command line (<c>*</c> for every rule).</summary>
    public void SetSeverity(string ruleId, ReportSeverity severity)
    {
        if (ruleId == "*")
        {
            foreach (var rule in RuleCatalog.All) severityOverrides[rule.Id] = severity;
            return;
        }

        if (RuleCatalog.Find(ruleId.ToUpperInvariant()) is null)
            throw new InputException($"unknown rule ID '{ruleId}' on the command line (known: {string.Join(", ", Ids())})");
        severityOverrides[ruleId.ToUpperInvariant()] = severity;
    }

    /// <summary>A <c>phaseward.</c> option from the command line: checked now (a bad value is an input error naming <paramref name="option"/>).</summary>
    public void SetOption(PhasewardOption definition, string value, string option)
    {
        if (definition.Check(value) is { } problem)
            throw new InputException($"the value '{value}' of option {option} is not valid: expected {problem.Expected}");
        optionOverrides[definition.Key] = value;
    }

    /// <summary>The rules' thresholds for a design whose <c>Describe</c> is in <paramref name="anchorPath"/>, and the values that could not be used.</summary>
    public (RulePolicy Policy, IReadOnlyList<OptionProblem> Problems) RulePolicyFor(string anchorPath)
    {
        var options = Configuration.For(anchorPath);
        var problems = new List<OptionProblem>();
        var policy = RulePolicyOptions.Read(key => optionOverrides.TryGetValue(key, out var given) ? given : options.Value(key), problems);
        return (policy, problems);
    }

    /// <summary>The severity of a rule's finding located in <paramref name="sourcePath"/>.</summary>
    public ReportSeverity SeverityOf(RuleDescriptor rule, string sourcePath)
    {
        if (severityOverrides.TryGetValue(rule.Id, out var given))
            return given;
        var configured = Configuration.For(sourcePath).ConfiguredSeverity(rule);
        var severity = configured is { } c ? SeverityPolicy.FromCompiler(c, rule.DefaultSeverity) : SeverityPolicy.FromDefault(rule.DefaultSeverity);
        return Build.Apply(rule.Id, severity);
    }

    private static IEnumerable<string> Ids()
    {
        foreach (var rule in RuleCatalog.All) yield return rule.Id;
    }
}
