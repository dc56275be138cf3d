using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Globalization;
using System.Linq;
using Microsoft.CodeAnalysis;
using Phaseward.Checking;
using Phaseward.Netlists;

namespace Phaseward.Analyzers.Diagnostics;

/// <summary>
/// One diagnostic per cause, not per copy: findings of one rule that land on the same call (a block placed in a loop, a
/// helper called for every lane) become one diagnostic that counts the instances and names the first few. The
/// run-time report keeps every instance; the editor shows one squiggle.
/// </summary>
internal static class InstanceGrouping
{
    /// <summary>Instances named in the message; the rest are counted.</summary>
    public const int NamedInstances = 3;

    /// <summary>Additional locations carried at most (the calls that led to the instances).</summary>
    public const int MaxRelatedLocations = 16;

    /// <summary>Groups the mapped findings by rule, primary and related locations, in the order they were found.</summary>
    /// <param name="callSite">The location of a call the instances went through (a <c>Place</c> call, a helper call in
    /// a loop), or null when it is not in this compilation.</param>
    public static IEnumerable<Diagnostic> Group(IReadOnlyList<(Finding Finding, Diagnostic Diagnostic)> mapped, string designName,
        Func<SourceSpan, Location?> callSite)
    {
        // Copies share the rule, the call and the calls of their related devices; two causes at one call (a latch fed by
        // two different latches) differ in their related locations and stay two diagnostics.
        foreach (var group in mapped.GroupBy(m => (m.Diagnostic.Id, m.Diagnostic.Location, Related: string.Join("|", m.Diagnostic.AdditionalLocations))))
        {
            var members = group.ToList();
            yield return members.Count == 1 ? members[0].Diagnostic : Merge(members, designName, callSite);
        }
    }

    private static Diagnostic Merge(List<(Finding Finding, Diagnostic Diagnostic)> members, string designName, Func<SourceSpan, Location?> callSite)
    {
        var first = members[0];
        var labels = Labels(members.Select(m => m.Finding).ToList());
        var named = string.Join(", ", labels.Take(NamedInstances)) + (labels.Count > NamedInstances ? ", ..." : "");
        var suffix = string.Format(CultureInfo.InvariantCulture, "; found {0} times at this call in design '{1}': {2}", members.Count, designName, named);

        // Related: each instance's own related locations, then the calls the instances went through (the Place calls,
        // the helper's call in a loop), each once.
        var calls = members.SelectMany(m => m.Finding.Location.Callers).Select(callSite).OfType<Location>();
        var additional = members.SelectMany(m => m.Diagnostic.AdditionalLocations).Concat(calls)
            .Distinct().Take(MaxRelatedLocations).ToList();
        var properties = first.Diagnostic.Properties
            .SetItem(FindingPropertyKeys.InstanceCount, members.Count.ToString(CultureInfo.InvariantCulture))
            .SetItem(FindingPropertyKeys.Instances, string.Join(";", labels));
        var arguments = first.Finding.Arguments.Cast<object?>().Append(suffix).ToArray();
        return Diagnostic.Create(Descriptors.ForInstances(first.Finding.Rule), first.Diagnostic.Location, additional, properties, arguments);
    }

    // An instance is named by the first message argument that tells the instances apart (a latch's or node's
    // hierarchical name, usually the first argument); failing that, by the first property that does; else by its number.
    internal static IReadOnlyList<string> Labels(IReadOnlyList<Finding> findings)
    {
        var argumentCount = findings.Min(f => f.Arguments.Count);
        for (var a = 0; a < argumentCount; a++)
        {
            if (findings.Select(f => f.Arguments[a]).Distinct(StringComparer.Ordinal).Count() > 1)
                return findings.Select(f => FirstOfList(f.Arguments[a])).ToArray();
        }

        foreach (var key in findings[0].Properties.Keys.OrderBy(k => k, StringComparer.Ordinal))
        {
            if (findings.All(f => f.Properties.ContainsKey(key))
                && findings.Select(f => f.Properties[key]).Distinct(StringComparer.Ordinal).Count() > 1)
                return findings.Select(f => f.Properties[key]).ToArray();
        }

        return Enumerable.Range(1, findings.Count).Select(i => "#" + i.ToString(CultureInfo.InvariantCulture)).ToArray();
    }

    // A list argument (a loop's devices: "'a', 'b', 'c'") is named by its first element.
    private static string FirstOfList(string argument)
    {
        var comma = argument.IndexOf("', '", StringComparison.Ordinal);
        return argument.StartsWith("'", StringComparison.Ordinal) && comma > 0 ? argument.Substring(0, comma + 1) : argument;
    }
}
