using System;
using System.Collections.Generic;
using System.Text.RegularExpressions;
using Phaseward.Checking;

namespace Phaseward.Reproducers;

/// <summary>
/// A SPICE deck that reproduces one finding: the sub-circuit involved, its figures, clocks and stimulus, and a
/// <c>.meas</c> per figure with Phaseward's estimate beside it (<c>* estimate NAME = VALUE</c>). Plain text that
/// ngspice runs in batch (<c>ngspice -b deck.cir</c>); writing it to a file is the caller's job.
/// </summary>
public sealed class SpiceDeck
{
    internal SpiceDeck(Finding finding, string designName, string text, IReadOnlyList<DeckEstimate> estimates)
    {
        Finding = finding;
        DesignName = designName;
        Text = text;
        Estimates = estimates;
    }

    /// <summary>The finding the deck reproduces.</summary>
    public Finding Finding { get; }

    /// <summary>The finding's rule ID.</summary>
    public string RuleId => Finding.RuleId;

    /// <summary>The design the finding was made on.</summary>
    public string DesignName { get; }

    /// <summary>The deck, ready for <c>ngspice -b</c>.</summary>
    public string Text { get; }

    /// <summary>The measured figures and Phaseward's estimates of them, in the order of the deck's <c>.meas</c> lines.</summary>
    public IReadOnlyList<DeckEstimate> Estimates { get; }

    /// <summary>
    /// The same deck with the value of one of its <c>.param</c> switches changed (for example <c>fix_phase</c> in a
    /// PW1001 deck, which puts the second latch on the complementary phase).
    /// </summary>
    public SpiceDeck WithParameter(string name, string value)
    {
        if (name is null) throw new ArgumentNullException(nameof(name));
        if (value is null) throw new ArgumentNullException(nameof(value));
        var pattern = new Regex(@"^\.param " + Regex.Escape(name) + @" = [^\r\n]*$", RegexOptions.Multiline);
        if (!pattern.IsMatch(Text))
            throw new ArgumentException($"The {RuleId} deck has no parameter '{name}'.", nameof(name));
        return new SpiceDeck(Finding, DesignName, pattern.Replace(Text, ".param " + name + " = " + value), Estimates);
    }

    /// <inheritdoc/>
    public override string ToString() => Text;
}
