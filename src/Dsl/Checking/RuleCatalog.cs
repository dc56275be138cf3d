using System;
using System.Collections.Generic;
using System.Linq;
using System.Reflection;

namespace Phaseward.Checking;

/// <summary>
/// The rule registry: every rule's ID, family, default severity, title, message format and description, written once
/// (one file per family). The analyzers' descriptors, the report tool and the checks on the release-tracking file, the
/// rule pages and the sample policy all derive from it; adding a rule adds one entry here.
/// </summary>
public static partial class RuleCatalog
{
    private static readonly Lazy<IReadOnlyList<RuleDescriptor>> Entries = new(CollectEntries);
    private static readonly Lazy<Dictionary<string, RuleDescriptor>> ById = new(() => All.ToDictionary(d => d.Id, StringComparer.Ordinal));

    /// <summary>Every entry, ordered by ID.</summary>
    public static IReadOnlyList<RuleDescriptor> All => Entries.Value;

    /// <summary>The entry with this ID, or null when there is none.</summary>
    public static RuleDescriptor? Find(string id) => id is not null && ById.Value.TryGetValue(id, out var descriptor) ? descriptor : null;

    // The entries are the catalog's static properties: collecting them by reflection means an entry cannot be written
    // and then forgotten in a second list. Lazy, because the family files' initialisers run in an unspecified order.
    private static IReadOnlyList<RuleDescriptor> CollectEntries()
        => typeof(RuleCatalog).GetProperties(BindingFlags.Public | BindingFlags.Static)
            .Where(p => p.PropertyType == typeof(RuleDescriptor))
            .Select(p => (RuleDescriptor)p.GetValue(null)!)
            .OrderBy(d => d.Id, StringComparer.Ordinal)
            .ToArray();
}
