using System;
using System.IO;
using System.Linq;
using System.Reflection;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Analyzers.Diagnostics;
using Phaseward.Analyzers.Tests.Elaboration;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests;

/// <summary>
/// Every diagnostic Phaseward reports is documented the way .NET users expect: a stable help link to its page under
/// docs/rules/, a category, a title, a message format with the figures as arguments, a line in the rule index and in
/// the analyzer release tracking, and it agrees with the DSL's rule catalog.
/// </summary>
public class DescriptorTests
{
    public static TheoryData<string> Ids()
    {
        var data = new TheoryData<string>();
        foreach (var descriptor in Descriptors.Declared)
            data.Add(descriptor.Id);
        return data;
    }

    [Theory]
    [MemberData(nameof(Ids))]
    public void DescriptorIsDocumentedAndTracked(string id)
    {
        var descriptor = Descriptors.Find(id)!;
        Assert.Matches("^PW[1-9][0-9]{3}$", id);
        Assert.Equal($"https://github.com/phaseward/phaseward/blob/main/docs/rules/{id}.md", descriptor.HelpLinkUri);
        Assert.True(File.Exists(Repository.PathOf("docs", "rules", id + ".md")), $"docs/rules/{id}.md is missing");
        Assert.StartsWith("Phaseward.", descriptor.Category, StringComparison.Ordinal);
        Assert.False(string.IsNullOrWhiteSpace(descriptor.Title.ToString(System.Globalization.CultureInfo.InvariantCulture)));
        Assert.False(string.IsNullOrWhiteSpace(descriptor.Description.ToString(System.Globalization.CultureInfo.InvariantCulture)));
        Assert.Contains("{0}", descriptor.MessageFormat.ToString(System.Globalization.CultureInfo.InvariantCulture), StringComparison.Ordinal);
        Assert.True(descriptor.IsEnabledByDefault);

        // The rule index lists it with its title and default severity.
        var index = File.ReadAllLines(Repository.PathOf("docs", "rules", "README.md"));
        var row = Assert.Single(index, l => l.StartsWith($"| [{id}]({id}.md) |", StringComparison.Ordinal));
        Assert.Contains($"| {descriptor.Title} |", row, StringComparison.Ordinal);
        Assert.EndsWith($"| {descriptor.DefaultSeverity} |", row, StringComparison.Ordinal);

        // Release tracking (the RS2xxx analyzers check this at build time too): one line, same category and severity.
        var tracked = new[] { "AnalyzerReleases.Shipped.md", "AnalyzerReleases.Unshipped.md" }
            .SelectMany(f => File.ReadAllLines(Repository.PathOf("src", "Analyzers", "Phaseward.Analyzers", f)))
            .Where(l => l.StartsWith(id + " ", StringComparison.Ordinal))
            .ToList();
        var line = Assert.Single(tracked).Split('|').Select(c => c.Trim()).ToArray();
        Assert.Equal((descriptor.Category, descriptor.DefaultSeverity.ToString()), (line[1], line[2]));
    }

    [Fact]
    public void DescriptorsAgreeWithTheRuleCatalog()
    {
        var catalog = typeof(RuleCatalog).GetProperties(BindingFlags.Public | BindingFlags.Static)
            .Where(p => p.PropertyType == typeof(RuleDescriptor))
            .Select(p => (RuleDescriptor)p.GetValue(null)!)
            .ToList();
        Assert.Equal(catalog.Select(r => r.Id).Order(StringComparer.Ordinal), RuleCatalog.All.Select(r => r.Id));
        Assert.Equal(catalog.Count, catalog.Select(r => r.Id).Distinct().Count());
        Assert.Equal(catalog.Select(r => r.Id).Order(StringComparer.Ordinal), Descriptors.Declared.Select(d => d.Id).Order(StringComparer.Ordinal));
        foreach (var rule in catalog)
        {
            var descriptor = Descriptors.Find(rule.Id)!;
            Assert.Equal(rule.Title, descriptor.Title.ToString(System.Globalization.CultureInfo.InvariantCulture));
            Assert.Equal(rule.MessageFormat, descriptor.MessageFormat.ToString(System.Globalization.CultureInfo.InvariantCulture));
            Assert.Equal(rule.Category, descriptor.Category);
            Assert.Equal(rule.HelpUri, descriptor.HelpLinkUri);
            Assert.Equal(rule.DefaultSeverity.ToString(), descriptor.DefaultSeverity.ToString());
        }
    }

    [Fact]
    public void RuleIndexListsNoUnknownRule()
    {
        var listed = File.ReadAllLines(Repository.PathOf("docs", "rules", "README.md"))
            .Where(l => l.StartsWith("| [PW", StringComparison.Ordinal))
            .Select(l => l.Substring(3, 6));
        Assert.Equal(Descriptors.Declared.Select(d => d.Id).Order(StringComparer.Ordinal), listed.Order(StringComparer.Ordinal));
        var pages = Directory.GetFiles(Repository.PathOf("docs", "rules"), "PW*.md").Select(Path.GetFileNameWithoutExtension);
        Assert.Equal(Descriptors.Declared.Select(d => d.Id).Order(StringComparer.Ordinal), pages.Order(StringComparer.Ordinal));
    }

    [Fact]
    public void ReleaseFilesTrackNoUnknownRule()
    {
        var tracked = new[] { "AnalyzerReleases.Shipped.md", "AnalyzerReleases.Unshipped.md" }
            .SelectMany(f => File.ReadAllLines(Repository.PathOf("src", "Analyzers", "Phaseward.Analyzers", f)))
            .Where(l => l.StartsWith("PW", StringComparison.Ordinal))
            .Select(l => l.Substring(0, 6));
        Assert.Equal(RuleCatalog.All.Select(r => r.Id), tracked.Order(StringComparer.Ordinal));
    }

    [Fact]
    public void EveryRuleRunsInTheAnalyzerOfItsFamily()
    {
        // Every rule class is in the rule set (a rule written but not listed would never run) ...
        var ruleTypes = typeof(Rule).Assembly.GetTypes().Where(t => t.IsSubclassOf(typeof(Rule)) && !t.IsAbstract);
        Assert.Equal(ruleTypes.Select(t => t.FullName).Order(StringComparer.Ordinal),
            Checker.Rules.Select(r => r.GetType().FullName).Order(StringComparer.Ordinal));

        // ... each reports findings of one family only, so exactly one family analyzer runs it ...
        foreach (var rule in Checker.Rules)
            Assert.Single(rule.Descriptors.Select(d => d.Family).Distinct());

        // ... and each family analyzer supports exactly its family's registry entries (PW9xxx: the elaboration analyzer).
        var analyzers = typeof(FindingAnalyzer).Assembly.GetTypes()
            .Where(t => !t.IsAbstract && typeof(DiagnosticAnalyzer).IsAssignableFrom(t))
            .Select(t => (DiagnosticAnalyzer)Activator.CreateInstance(t)!)
            .ToList();
        foreach (var entry in RuleCatalog.All)
        {
            var supporting = analyzers.Where(a => a.SupportedDiagnostics.Any(d => d.Id == entry.Id)).ToList();
            var analyzer = Assert.Single(supporting);
            var runBy = analyzer is FindingAnalyzer findingAnalyzer ? findingAnalyzer.Rules.Where(r => r.Descriptors.Contains(entry)).ToList() : [];
            if (runBy.Count == 0)
            {
                // Not a rule's finding: what the elaborator itself met, reported by the elaboration analyzer.
                Assert.IsType<ElaborationAnalyzer>(analyzer);
                Assert.Equal(RuleFamily.Elaboration, entry.Family);
            }
        }
    }

    [Theory]
    [InlineData("PW1001", RuleFamily.Timing)]
    [InlineData("PW10011", RuleFamily.ClockPhases)]
    [InlineData("XW1001", RuleFamily.ClockPhases)]
    [InlineData("PW1a01", RuleFamily.ClockPhases)]
    public void AnEntryWhoseIdDoesNotNameItsFamilyIsRefused(string id, RuleFamily family)
    {
        var error = Assert.Throws<ArgumentException>(() => new RuleDescriptor(id, family, Severity.Warning, "t", "{0}", "d"));
        Assert.Contains(id, error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void EveryCheckingRuleSaysItsFiguresAreEstimatesOrThatItIsStructural()
    {
        foreach (var entry in RuleCatalog.All.Where(e => e.Family != RuleFamily.Elaboration))
            Assert.True(entry.Description.Contains("estimate", StringComparison.OrdinalIgnoreCase)
                || entry.Description.Contains("Structural check", StringComparison.Ordinal),
                $"{entry.Id}'s description neither calls its figures estimates nor says it is a structural check");
    }
}
