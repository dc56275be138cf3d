using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Text;
using Phaseward.Analyzers.Elaboration;
using Phaseward.Checking;
using Phaseward.Netlists;

namespace Phaseward.Analyzers.Diagnostics;

/// <summary>
/// The one place that turns what the rules and the elaborator report (findings and issues, located by
/// <see cref="SourceSpan"/>) into diagnostics. Every diagnostic lands in the document that holds the design's
/// Describe (the document being analysed): a span in another file is replaced by the innermost call in that document
/// that led there, and the original span becomes an additional location.
/// </summary>
internal sealed class DiagnosticMapper
{
    private readonly ElaborationSession session;
    private readonly DesignInfo design;

    public DiagnosticMapper(ElaborationSession session, DesignInfo design)
    {
        this.session = session;
        this.design = design;
    }

    /// <summary>The finding's diagnostic, its properties naming the process its figures came from (so a SARIF result
    /// says which process figures, perhaps invented defaults, its estimate used); without a process, as found.</summary>
    public Diagnostic? FromFinding(Finding finding, Process? process = null)
    {
        var descriptor = Descriptors.Find(finding.RuleId);
        if (descriptor is null)
            return null;
        var properties = new Dictionary<string, string>(finding.Properties.Count + 1);
        foreach (var property in finding.Properties)
            properties[property.Key] = property.Value;
        if (process is not null)
            properties[FindingPropertyKeys.Process] = process.Name;
        return Create(descriptor, finding.Location, finding.RelatedLocations, finding.Arguments, properties);
    }

    public Diagnostic? FromIssue(ElaborationIssue issue)
    {
        var descriptor = Descriptors.Find(issue.RuleId);
        return descriptor is null ? null : Create(descriptor, issue.Location, System.Array.Empty<SourceSpan>(), issue.Arguments, null);
    }

    public Diagnostic Create(DiagnosticDescriptor descriptor, SourceSpan span, IReadOnlyList<SourceSpan> related, IReadOnlyList<string> arguments,
        IReadOnlyDictionary<string, string>? properties)
    {
        var additional = new List<Location>();
        var primary = Place(span, additional);
        foreach (var other in related)
            if (Exact(other) is { } location)
                additional.Add(location);

        var props = properties is null || properties.Count == 0
            ? ImmutableDictionary<string, string?>.Empty
            : properties.ToImmutableDictionary(p => p.Key, p => (string?)p.Value);
        return Diagnostic.Create(descriptor, primary, additional, props, arguments.Cast<object?>().ToArray());
    }

    /// <summary>The location in the design's document for a span (see the class remarks).</summary>
    public Location Place(SourceSpan span, List<Location> additional)
    {
        var anchorPath = design.AnchorTree.FilePath;
        if (span.Path == anchorPath && Exact(span) is { } here)
            return here;

        if (Exact(span) is { } elsewhere)
            additional.Add(elsewhere);
        for (var i = span.Callers.Count - 1; i >= 0; i--)
            if (span.Callers[i].Path == anchorPath && Exact(span.Callers[i]) is { } call)
                return call;
        return design.AnchorLocation;
    }

    /// <summary>The exact location of a compile-time span, or null if it names no tree of this compilation.</summary>
    public Location? Exact(SourceSpan span)
    {
        if (span.Start < 0 || session.TreeAt(span.Path) is not { } tree)
            return null;
        var length = tree.Length;
        if (span.Start > length)
            return null;
        return Location.Create(tree, new TextSpan(span.Start, System.Math.Min(span.Length, length - span.Start)));
    }
}
