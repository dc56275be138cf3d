using System.Collections.Generic;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Analyzers.Elaboration;
using Phaseward.Checking;
using Phaseward.Configuration;

namespace Phaseward.Analyzers.Options;

/// <summary>Everything Phaseward reads from the options of one document: elaboration limits, rule policy, problems met.</summary>
internal sealed class PhasewardOptions
{
    private PhasewardOptions(ElaborationLimits limits, RulePolicy policy, IReadOnlyList<OptionProblem> problems)
    {
        Limits = limits;
        Policy = policy;
        Problems = problems;
    }

    public ElaborationLimits Limits { get; }

    public RulePolicy Policy { get; }

    public IReadOnlyList<OptionProblem> Problems { get; }

    /// <summary>Reads every <c>phaseward.</c> key through its one definition (<see cref="OptionCatalog"/>).</summary>
    public static PhasewardOptions Read(AnalyzerConfigOptions options)
    {
        var problems = new List<OptionProblem>();
        string? Lookup(string key) => options.TryGetValue(key, out var value) ? value : null;
        var limits = new ElaborationLimits(
            OptionCatalog.ElaborationStepBudget.Read(Lookup, problems),
            (int)OptionCatalog.ElaborationRecursionLimit.Read(Lookup, problems),
            OptionCatalog.ElaborationDeviceBudget.Read(Lookup, problems),
            OptionCatalog.ElaborationMemoryBudget.Read(Lookup, problems));
        var policy = RulePolicyOptions.Read(Lookup, problems);
        return new PhasewardOptions(limits, policy, problems);
    }
}
