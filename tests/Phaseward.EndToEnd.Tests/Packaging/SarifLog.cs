using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using System.Text.Json;

namespace Phaseward.EndToEnd.Tests.Packaging;

/// <summary>The results of a SARIF 2.1 log the compiler wrote (<c>-p:ErrorLog=path%2Cversion=2.1</c>).</summary>
internal static class SarifLog
{
    public static (string Version, IReadOnlyList<SarifResult> Results, IReadOnlyDictionary<string, string?> HelpUris) Read(string path)
    {
        using var log = JsonDocument.Parse(File.ReadAllText(path));
        var root = log.RootElement;
        var version = root.GetProperty("version").GetString() ?? string.Empty;
        var results = new List<SarifResult>();
        var helpUris = new Dictionary<string, string?>();
        foreach (var run in root.GetProperty("runs").EnumerateArray())
        {
            if (run.GetProperty("tool").GetProperty("driver").TryGetProperty("rules", out var rules))
                foreach (var rule in rules.EnumerateArray())
                    helpUris[rule.GetProperty("id").GetString()!] = rule.TryGetProperty("helpUri", out var help) ? help.GetString() : null;

            foreach (var result in run.GetProperty("results").EnumerateArray())
            {
                var suppressed = result.TryGetProperty("suppressions", out var suppressions) && suppressions.GetArrayLength() > 0;
                var location = result.TryGetProperty("locations", out var locations) && locations.GetArrayLength() > 0
                    ? locations[0].GetProperty("physicalLocation")
                    : (JsonElement?)null;
                var region = location?.GetProperty("region");
                results.Add(new SarifResult(
                    result.GetProperty("ruleId").GetString() ?? string.Empty,
                    result.TryGetProperty("level", out var level) ? level.GetString() ?? "warning" : "warning",
                    result.GetProperty("message").GetProperty("text").GetString() ?? string.Empty,
                    location?.GetProperty("artifactLocation").GetProperty("uri").GetString(),
                    region?.GetProperty("startLine").GetInt32() ?? 0,
                    region?.GetProperty("startColumn").GetInt32() ?? 0,
                    suppressed));
            }
        }

        return (version, results, helpUris);
    }
}

/// <summary>One result of a SARIF log: rule, level, message, file and 1-based start of its region.</summary>
internal sealed record SarifResult(string RuleId, string Level, string Message, string? Uri, int StartLine, int StartColumn, bool Suppressed)
{
    public bool IsPhaseward => RuleId.StartsWith("PW", StringComparison.Ordinal);

    public string FileName => Uri is null ? string.Empty : Path.GetFileName(new Uri(Uri).LocalPath);
}
