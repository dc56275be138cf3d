using System;
using System.Collections.Concurrent;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Checking;

namespace Phaseward.Cli.Policy;

/// <summary>
/// The analyzer configuration of a design project exactly as the compiler reads it: the project's .editorconfig and
/// global config files, parsed and combined by Roslyn's own <see cref="AnalyzerConfigSet"/> (sections, globs,
/// <c>root = true</c>, global configs and their precedence), asked per source file.
/// </summary>
internal sealed class ReportConfiguration
{
    private readonly AnalyzerConfigSet? set;
    private readonly ConcurrentDictionary<string, SourceFileOptions> byPath = new(StringComparer.Ordinal);

    private ReportConfiguration(IReadOnlyList<string> files, AnalyzerConfigSet? set)
    {
        Files = files;
        this.set = set;
    }

    /// <summary>No configuration: every rule at its default severity, every option at its default.</summary>
    public static ReportConfiguration None { get; } = new(Array.Empty<string>(), null);

    /// <summary>The config files read, in the order given.</summary>
    public IReadOnlyList<string> Files { get; }

    /// <summary>Reads the given .editorconfig / global config files (as the compiler's <c>/analyzerconfig:</c> list).</summary>
    public static ReportConfiguration Load(IEnumerable<string> files)
    {
        var paths = files.Select(Path.GetFullPath).Distinct(StringComparer.Ordinal).ToList();
        var configs = new List<AnalyzerConfig>();
        foreach (var path in paths)
        {
            try
            {
                configs.Add(AnalyzerConfig.Parse(File.ReadAllText(path), path));
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                throw new InputException($"cannot read the analyzer config file '{path}': {e.Message}");
            }
        }

        return new ReportConfiguration(paths, AnalyzerConfigSet.Create(configs, out var diagnostics)) { SetDiagnostics = diagnostics };
    }

    /// <summary>What the compiler would warn about the config files themselves (conflicting global keys, ...).</summary>
    public IReadOnlyList<Diagnostic> SetDiagnostics { get; private init; } = Array.Empty<Diagnostic>();

    /// <summary>The options that apply to one source file (a full path, as the compiler sees it).</summary>
    public SourceFileOptions For(string sourcePath)
        => set is null || string.IsNullOrEmpty(sourcePath)
            ? SourceFileOptions.Empty
            : byPath.GetOrAdd(sourcePath, path => new SourceFileOptions(set.GetOptionsForSourcePath(path), set.GlobalConfigOptions));

    /// <summary>Every warning about the configuration met so far (the set's own and each source file's), each once.</summary>
    public IEnumerable<string> Warnings()
        => SetDiagnostics.Concat(byPath.Values.SelectMany(o => o.Diagnostics))
            .Select(d => d.GetMessage(System.Globalization.CultureInfo.InvariantCulture))
            .Distinct(StringComparer.Ordinal);
}

/// <summary>The analyzer options of one source file: diagnostic severities and other keys (<c>phaseward.</c> ones among them).</summary>
internal sealed class SourceFileOptions
{
    private const string BulkSeverityKey = "dotnet_analyzer_diagnostic.severity";

    private readonly AnalyzerConfigOptionsResult result;
    private readonly AnalyzerConfigOptionsResult global;

    /// <param name="result">The options of the file (its .editorconfig sections, and the global configs' keys).</param>
    /// <param name="global">The global configs' options, whose severities the compiler consults when the file's own set none.</param>
    public SourceFileOptions(AnalyzerConfigOptionsResult result, AnalyzerConfigOptionsResult global)
    {
        this.result = result;
        this.global = global;
    }

    public static SourceFileOptions Empty { get; } = new(default, default);

    public IEnumerable<Diagnostic> Diagnostics => result.Diagnostics.IsDefault ? Enumerable.Empty<Diagnostic>() : result.Diagnostics;

    /// <summary>The value of a key (keys are case-insensitive, as in the compiler), or null when not set.</summary>
    public string? Value(string key)
        => result.AnalyzerOptions is { } options && options.TryGetValue(key.ToLowerInvariant(), out var value) ? value : null;

    /// <summary>
    /// The severity configured for a rule, as the compiler resolves it: <c>dotnet_diagnostic.ID.severity</c> of the
    /// file's .editorconfig sections, else of the global configs, else (for a
    /// rule enabled by default) <c>dotnet_analyzer_diagnostic.category-Category.severity</c>, else
    /// <c>dotnet_analyzer_diagnostic.severity</c>; null when none is set.
    /// </summary>
    public ReportDiagnostic? ConfiguredSeverity(RuleDescriptor rule)
    {
        foreach (var options in new[] { result.TreeOptions, global.TreeOptions })
            if (options is { } tree && tree.TryGetValue(rule.Id, out var specific) && specific != ReportDiagnostic.Default)
                return specific;
        // Bulk keys apply to rules enabled by default only: every Phaseward rule is (DescriptorFactory).
        foreach (var key in new[] { $"dotnet_analyzer_diagnostic.category-{rule.Category}.severity", BulkSeverityKey })
            if (Value(key) is { } text && TryParseSeverity(text, out var bulk))
                return bulk;
        return null;
    }

    /// <summary>The severity words of analyzer config files, as the compiler accepts them.</summary>
    private static bool TryParseSeverity(string text, out ReportDiagnostic severity)
    {
        severity = text.Trim().ToLowerInvariant() switch
        {
            "default" => ReportDiagnostic.Default,
            "error" => ReportDiagnostic.Error,
            "warning" => ReportDiagnostic.Warn,
            "suggestion" => ReportDiagnostic.Info,
            "silent" or "refactoring" => ReportDiagnostic.Hidden,
            "none" => ReportDiagnostic.Suppress,
            _ => (ReportDiagnostic)(-1),
        };
        return severity is not ReportDiagnostic.Default and not (ReportDiagnostic)(-1);
    }
}
