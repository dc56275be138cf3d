using System;
using System.IO;
using System.Linq;
using System.Xml.Linq;

namespace Phaseward.Cli.Tests;

/// <summary>Runs the report command in-process and keeps what it printed.</summary>
internal sealed record CliRun(int ExitCode, string Out, string Err)
{
    public static CliRun Of(params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        var code = ReportCommand.Run(args, stdout, stderr);
        return new CliRun(code, stdout.ToString(), stderr.ToString());
    }

    /// <summary>The Quorvane sample assembly built beside the tests.</summary>
    public static string QuorvaneDll { get; } = Path.Combine(AppContext.BaseDirectory, "Quorvane.dll");

    public static string NewTempDirectory()
    {
        var path = Path.Combine(Path.GetTempPath(), "phaseward-cli-tests-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(path);
        return path;
    }

    /// <summary>Reads an HTML page as XML (the report writes well-formed XHTML-compatible markup).</summary>
    public static XDocument ReadPage(string path) => XDocument.Load(path, LoadOptions.None);

    public static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    public static string? Class(XElement e) => (string?)e.Attribute("class");

    public static bool HasClass(XElement e, string cls) => (Class(e) ?? string.Empty).Split(' ').Contains(cls);
}
