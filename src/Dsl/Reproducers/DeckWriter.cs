using System;
using System.Collections.Generic;
using System.Globalization;
using System.Text;
using Phaseward.Checking;
using Phaseward.Electrical;
using Phaseward.Netlists;

namespace Phaseward.Reproducers;

/// <summary>
/// Builds the text of one deck: the header (finding, location, caution, estimates), the parameters, the simple
/// device models behind an <c>.include</c> hook, the elements, the analysis and the measurements.
/// </summary>
internal sealed class DeckWriter
{
    private readonly Finding finding;
    private readonly Netlist netlist;
    private readonly List<string> description = new();
    private readonly List<string> parameters = new();
    private readonly List<string> elements = new();
    private readonly List<string> measurements = new();
    private readonly List<DeckEstimate> estimates = new();
    private readonly Dictionary<int, string> netNodes = new();
    private readonly HashSet<string> usedNodes = new(StringComparer.OrdinalIgnoreCase);
    private readonly HashSet<string> capacitorsOn = new(StringComparer.OrdinalIgnoreCase);
    private string analysis = string.Empty;
    private int elementCount;
    private Corner corner = Corner.Nominal;

    public DeckWriter(Finding finding, Netlist netlist)
    {
        this.finding = finding;
        this.netlist = netlist;
        Supply = netlist.Process.Supply.Volts;
        Param("vdd", SpiceNumbers.Of(Supply), "supply (V), the process figure");
    }

    public double Supply { get; }

    public Netlist Netlist => netlist;

    /// <summary>The factor every on-resistance of the deck takes: the corner the finding's figures are at.</summary>
    public double DelayFactor => netlist.Process.DelayFactor(corner);

    /// <summary>Simulates at <paramref name="atCorner"/>: every on-resistance the deck draws is the design's figure times
    /// the corner's factor, as the rule's first-order delays are (set before drawing any element).</summary>
    public void AtCorner(Corner atCorner) => corner = atCorner;

    /// <summary>A nominal on-resistance at the deck's corner.</summary>
    public Resistance AtCorner(Resistance nominal) => nominal * DelayFactor;

    /// <summary>A line of the header explaining what this deck reproduces and how.</summary>
    public void Describe(string line) => description.Add(line);

    public void Param(string name, string value, string meaning) => parameters.Add($".param {name} = {value}" + (meaning.Length > 0 ? "   $ " + meaning : string.Empty));

    public void Comment(string text) => elements.Add("* " + text);

    /// <summary>The deck's node for a net of the design (names made SPICE-safe, and unique).</summary>
    public string Node(Net net)
    {
        if (netNodes.TryGetValue(net.Id, out var node)) return node;
        node = Fresh("n_" + Safe(net.Name));
        netNodes[net.Id] = node;
        return node;
    }

    /// <summary>A node the deck adds (sources, controls), unique.</summary>
    public string Fresh(string name)
    {
        var candidate = name;
        for (var k = 2; !usedNodes.Add(candidate); k++)
            candidate = name + "_" + k.ToString(CultureInfo.InvariantCulture);
        return candidate;
    }

    /// <summary>The net's capacitance to ground (once per node).</summary>
    public void Capacitor(string node, Capacitance value, string why)
    {
        if (!capacitorsOn.Add(node)) return;
        elements.Add($"C{++elementCount}_{node} {node} 0 {SpiceNumbers.Of(value.Farads)}   $ {why}");
    }

    /// <summary>A pass device as the <c>pw_tg</c> switch with its on-resistance, conducting while <paramref name="control"/> is above vdd/2.</summary>
    public void PassGate(Device device, string from, string to, string control)
        => elements.Add($"X{++elementCount}_{Safe(device.Name)} {from} {to} {control} pw_tg ron={SpiceNumbers.Of(AtCorner(netlist.ResistanceOf(device)).Ohms)}   $ {device.Kind} '{device.Name}' ({ControlText(device)})");

    /// <summary>A restoring stage: its logic function (other inputs at their non-controlling level) behind its output resistance.</summary>
    public void RestoringStage(Device device, string input, string output)
    {
        var model = device.Kind switch
        {
            DeviceKind.Buffer => "pw_buf",
            _ => "pw_inv", // an inverter, or a NAND/NOR with its other inputs at the non-controlling level: it inverts the path's input
        };
        elements.Add($"X{++elementCount}_{Safe(device.Name)} {input} {output} {model} r={SpiceNumbers.Of(AtCorner(netlist.ResistanceOf(device)).Ohms)}   $ {device.Kind} '{device.Name}'"
            + (device.Inputs.Count > 1 ? " (its other inputs held at the level that lets the path through)" : string.Empty));
    }

    /// <summary>The node's leakage: a constant current, as the retention estimate takes it (tapered to zero near 0 V).</summary>
    public void Leakage(string node, Current leakage)
        => elements.Add($"B{++elementCount}_leak {node} 0 I = {SpiceNumbers.Of(leakage.Amperes)} * tanh(V({node}) / 0.02)   $ I_leak: constant, as t_ret = C·ΔV/I_leak assumes; tapered to 0 within ~50 mV of ground");

    public void Element(string line) => elements.Add(line);

    public string NextName(string prefix) => prefix + (++elementCount).ToString(CultureInfo.InvariantCulture);

    /// <summary>A voltage source following the given (time, volts) points.</summary>
    public void Pwl(string node, IReadOnlyList<(double Time, double Volts)> points, string why)
    {
        var text = new StringBuilder();
        text.Append('V').Append(++elementCount).Append('_').Append(node).Append(' ').Append(node).Append(" 0 PWL(");
        text.Append(SpiceNumbers.Of(points[0].Time)).Append(' ').Append(SpiceNumbers.Of(points[0].Volts));
        for (var i = 1; i < points.Count; i++)
        {
            // Six points a line, continued with '+', so that long clock waveforms stay readable.
            text.Append(i % 6 == 0 ? "\n+ " : " ");
            text.Append(SpiceNumbers.Of(points[i].Time)).Append(' ').Append(SpiceNumbers.Of(points[i].Volts));
        }

        text.Append(")   $ ").Append(why);
        elements.Add(text.ToString());
    }

    public void Dc(string node, string volts, string why) => elements.Add($"V{++elementCount}_{node} {node} 0 {volts}   $ {why}");

    public void Transient(Time step, Time stop, Time maxStep)
        => analysis = $".tran {SpiceNumbers.Of(step)} {SpiceNumbers.Of(stop)} 0 {SpiceNumbers.Of(maxStep)}";

    /// <summary>
    /// The instant to read a settled level at: just before <paramref name="stop"/>. ngspice refuses a FIND ... AT
    /// equal to the stop time when its last time point falls a rounding error short of it ("out of interval").
    /// </summary>
    public static Time SettledBefore(Time stop) => stop * 0.99;

    /// <summary>A measurement and Phaseward's estimate of it (null: measured only, to help read the others).</summary>
    public void Measure(string statement, DeckEstimate? estimate)
    {
        measurements.Add(statement);
        if (estimate is not null) estimates.Add(estimate);
    }

    public SpiceDeck Build()
    {
        var text = new StringBuilder();
        var rule = finding.Rule;
        text.Append("* Phaseward reproducer deck: ").Append(rule.Id).Append(" (").Append(rule.Title).AppendLine(")");
        text.Append("* Design: ").AppendLine(netlist.DesignName);
        text.Append("* Location: ").AppendLine(finding.Location.ToString());
        foreach (var line in Wrap("Message: " + finding.Message))
            text.Append("* ").AppendLine(line);
        text.Append("* Process: ").AppendLine(netlist.Process.Name);
        if (corner != Corner.Nominal)
            text.Append("* Corner: ").Append(CornerText.Of(netlist.Process, corner))
                .AppendLine(" (every on-resistance below is the design's figure times this factor, as the rule's delays are)");
        text.AppendLine("*");
        foreach (var line in Wrap(Caution))
            text.Append("* ").AppendLine(line);
        text.AppendLine("*");
        foreach (var line in description)
            foreach (var wrapped in Wrap(line))
                text.Append("* ").AppendLine(wrapped);
        text.AppendLine("*");
        text.AppendLine("* Phaseward's estimates of the measured figures (SI units):");
        foreach (var estimate in estimates)
            text.Append("* estimate ").Append(estimate.Name).Append(" = ").Append(SpiceNumbers.Exact(estimate.Value))
                .Append("   (").Append(estimate.Meaning).AppendLine(")");
        text.AppendLine();
        foreach (var line in parameters)
            text.AppendLine(line);
        text.AppendLine();
        text.AppendLine(SimpleModels.Text);
        foreach (var line in elements)
            text.AppendLine(line);
        text.AppendLine();
        text.AppendLine(analysis);
        foreach (var line in measurements)
            text.AppendLine(line);
        text.AppendLine(".end");
        return new SpiceDeck(finding, netlist.DesignName, text.ToString(), estimates.ToArray());
    }

    public const string Caution =
        "CAUTION: a first-order reproduction of a first-order estimate. Pass devices are switches with their on-resistance, "
        + "restoring stages ideal logic behind their output resistance, nets lumped capacitances, leakage a constant current; "
        + "the figures are Phaseward's (the design's process figures or its invented illustrative defaults), not the foundry's models. "
        + "Confirm with transistor-level simulation at the process corners, the foundry's rules and sign-off.";

    public static string Safe(string name)
    {
        var text = new StringBuilder(name.Length);
        foreach (var c in name)
            text.Append(c is >= 'a' and <= 'z' or >= 'A' and <= 'Z' or >= '0' and <= '9' ? c : '_');
        return text.ToString();
    }

    private static string ControlText(Device device)
        => device.ClockControl is { } phase ? "on " + phase.Name : device.DataControl is { } net ? "controlled by net " + net.Name : "always on";

    private static IEnumerable<string> Wrap(string text)
    {
        const int width = 112;
        var line = new StringBuilder();
        foreach (var word in text.Replace('\n', ' ').Split(' '))
        {
            if (line.Length > 0 && line.Length + 1 + word.Length > width)
            {
                yield return line.ToString();
                line.Clear().Append("  ");
            }

            if (line.Length > 0 && line.ToString() != "  ") line.Append(' ');
            line.Append(word);
        }

        if (line.Length > 0) yield return line.ToString();
    }
}
