using System;
using System.IO;
using System.Linq;
using System.Reflection;
using Microsoft.CodeAnalysis;
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
}
