using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using Microsoft.CodeAnalysis;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Diagnostics;

/// <summary>Every descriptor Phaseward reports: one per <see cref="RuleCatalog"/> entry, made by <see cref="DescriptorFactory"/>.</summary>
internal static class Descriptors
{
    private static readonly ImmutableDictionary<string, DiagnosticDescriptor> ById =
        RuleCatalog.All.ToImmutableDictionary(rule => rule.Id, DescriptorFactory.Create, StringComparer.Ordinal);

    /// <summary>Every declared descriptor, ordered by ID.</summary>
    public static IReadOnlyList<DiagnosticDescriptor> Declared { get; } = ById.Values.OrderBy(d => d.Id, StringComparer.Ordinal).ToArray();

    /// <summary>The descriptor of a registry entry.</summary>
    public static DiagnosticDescriptor Of(RuleDescriptor rule) => ById[rule.Id];

    /// <summary>The descriptor of a rule ID, or null if the registry has none.</summary>
    public static DiagnosticDescriptor? Find(string id) => id is not null && ById.TryGetValue(id, out var descriptor) ? descriptor : null;
}
