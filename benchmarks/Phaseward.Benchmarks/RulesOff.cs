using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using Microsoft.CodeAnalysis;
using Phaseward.Checking;

namespace Phaseward.Benchmarks;

/// <summary>
/// Rules switched off for a run (<c>--rules-off PW1004,PW3005</c>): as a build switches them off (<c>NoWarn</c>, so the
/// analyzers skip the rules whose every diagnostic is off) and, for the phases called directly, the same rules left out.
/// A run with and a run without them compare what those rules cost at each size.
/// </summary>
internal sealed class RulesOff
{
    private RulesOff(ImmutableHashSet<string> ids)
    {
        Ids = ids;
        CompilationOptions = ids.IsEmpty ? null : ids.ToImmutableDictionary(id => id, _ => ReportDiagnostic.Suppress);
        Running = Checker.Rules.Where(r => !r.Descriptors.All(d => ids.Contains(d.Id))).ToArray();
    }

    public static RulesOff None { get; } = new(ImmutableHashSet<string>.Empty);

    public ImmutableHashSet<string> Ids { get; }

    /// <summary>Suppress for each ID, as <c>NoWarn</c> puts it in the compilation's options (null when none is off).</summary>
    public ImmutableDictionary<string, ReportDiagnostic>? CompilationOptions { get; }

    /// <summary>The rules of <see cref="Checker.Rules"/> with a diagnostic still on.</summary>
    public IReadOnlyList<Rule> Running { get; }

    /// <summary>The IDs of a comma-separated list; each must be a diagnostic of one of Phaseward's rules.</summary>
    public static RulesOff Parse(string option, string text)
    {
        var known = Checker.Rules.SelectMany(r => r.Descriptors).Select(d => d.Id).ToImmutableHashSet(StringComparer.Ordinal);
        var ids = text.Split(',').Select(t => t.Trim()).ToArray();
        foreach (var id in ids)
        {
            if (!known.Contains(id))
                throw new ArgumentException($"Option '{option}' takes IDs of Phaseward's rules, such as PW3004 ('{id}' is not one).");
        }

        return new RulesOff(ids.ToImmutableHashSet(StringComparer.Ordinal));
    }

    public override string ToString() => Ids.IsEmpty ? "none" : string.Join(", ", Ids.OrderBy(id => id, StringComparer.Ordinal));
}
