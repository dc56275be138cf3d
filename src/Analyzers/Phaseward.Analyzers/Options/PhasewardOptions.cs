using System.Collections.Generic;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Analyzers.Elaboration;
using Phaseward.Checking;

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

    public static PhasewardOptions Read(AnalyzerConfigOptions options)
    {
        var problems = new List<OptionProblem>();
        var reader = new OptionReader(options, problems);
        var limits = new ElaborationLimits(
            reader.Integer(OptionKeys.ElaborationStepBudget, ElaborationLimits.DefaultStepBudget, 1, long.MaxValue / 2),
            reader.Integer(OptionKeys.ElaborationRecursionLimit, ElaborationLimits.DefaultRecursionLimit, 1, ElaborationLimits.MaxRecursionLimit),
            reader.Integer(OptionKeys.ElaborationDeviceBudget, ElaborationLimits.DefaultDeviceBudget, 1, int.MaxValue),
            reader.Integer(OptionKeys.ElaborationMemoryBudget, ElaborationLimits.DefaultMemoryBudget, 1, ElaborationLimits.MaxMemoryBudget));
        var policy = RulePolicyReader.Read(reader);
        return new PhasewardOptions(limits, policy, problems);
    }
}
