using System;
using System.Collections.Generic;
using System.IO;
using System.Text;
using System.Text.RegularExpressions;

namespace Phaseward.Cli.Policy;

/// <summary>
/// Reads the keys that apply to C# files from the .editorconfig files in a folder and its parents (up to the one that
/// says <c>root = true</c>), nearer files winning, later sections winning within a file. Sections count when their glob
/// matches a file name ending in .cs (<c>[*]</c>, <c>[*.cs]</c>, <c>[*.{cs,vb}]</c>, <c>[**.cs]</c>, <c>[**/*.cs]</c>...);
/// sections for particular paths are skipped: the report applies one severity per rule to the whole design.
/// </summary>
internal static class EditorConfig
{
    /// <summary>The .editorconfig files that apply to a folder, nearest first, up to the first with <c>root = true</c>.</summary>
    public static IReadOnlyList<string> FilesAbove(string directory)
    {
        var files = new List<string>();
        for (var dir = new DirectoryInfo(directory); dir is not null; dir = dir.Parent)
        {
            var path = Path.Combine(dir.FullName, ".editorconfig");
            if (!File.Exists(path)) continue;
            files.Add(path);
            if (IsRoot(path)) break;
        }

        return files;
    }

    /// <summary>Key/value pairs of the sections that apply to .cs files, in file order.</summary>
    public static IEnumerable<(string Key, string Value)> Parse(IEnumerable<string> lines)
    {
        var applies = false;
        foreach (var raw in lines)
        {
            var line = raw.Trim();
            if (line.Length == 0 || line[0] is '#' or ';') continue;
            if (line[0] == '[' && line[^1] == ']')
            {
                applies = AppliesToCSharp(line[1..^1]);
                continue;
            }

            var eq = line.IndexOf('=');
            if (eq <= 0 || !applies) continue;
            yield return (line[..eq].Trim().ToLowerInvariant(), StripComment(line[(eq + 1)..]).Trim());
        }
    }

    public static bool AppliesToCSharp(string glob)
    {
        if (glob.StartsWith("**/", StringComparison.Ordinal)) glob = glob[3..];
        if (glob.Contains('/')) return false;
        return Regex.IsMatch("Design.cs", "^" + ToRegex(glob) + "$");
    }

    private static bool IsRoot(string path)
    {
        foreach (var raw in File.ReadLines(path))
        {
            var line = raw.Trim();
            if (line.StartsWith('[')) return false;
            var eq = line.IndexOf('=');
            if (eq > 0 && line[..eq].Trim().Equals("root", StringComparison.OrdinalIgnoreCase))
                return StripComment(line[(eq + 1)..]).Trim().Equals("true", StringComparison.OrdinalIgnoreCase);
        }

        return false;
    }

    private static string StripComment(string value)
    {
        var hash = value.IndexOfAny(new[] { '#', ';' });
        return hash >= 0 && (hash == 0 || char.IsWhiteSpace(value[hash - 1])) ? value[..hash] : value;
    }

    private static string ToRegex(string glob)
    {
        var regex = new StringBuilder();
        for (var i = 0; i < glob.Length; i++)
        {
            var c = glob[i];
            switch (c)
            {
                case '*': regex.Append(".*"); if (i + 1 < glob.Length && glob[i + 1] == '*') i++; break;
                case '?': regex.Append('.'); break;
                case '{':
                    var close = glob.IndexOf('}', i);
                    if (close < 0) { regex.Append("\\{"); break; }
                    var options = glob[(i + 1)..close].Split(',');
                    regex.Append("(?:").Append(string.Join("|", Array.ConvertAll(options, ToRegex))).Append(')');
                    i = close;
                    break;
                case '[':
                    var end = glob.IndexOf(']', i);
                    if (end < 0) { regex.Append("\\["); break; }
                    regex.Append('[').Append(glob[(i + 1)..end].Replace("\\", "\\\\").Replace("!", "^")).Append(']');
                    i = end;
                    break;
                default: regex.Append(Regex.Escape(c.ToString())); break;
            }
        }

        return regex.ToString();
    }
}
