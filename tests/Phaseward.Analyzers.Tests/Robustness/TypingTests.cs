using System;
using System.Collections.Generic;
using System.Linq;
using System.Text;
using System.Text.RegularExpressions;
using System.Threading.Tasks;
using CsCheck;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Phaseward.Tests.Properties;

namespace Phaseward.Analyzers.Tests.Robustness;

/// <summary>
/// Every sample file as it is being typed (prefixes, sampled), and random token-level mutations of the samples (drawn
/// by CsCheck, shrunk on failure):
/// the analyzers never throw (AD0001), never fail inside the elaborator, and never hang. The other sample files stay
/// whole, as in the editor.
/// </summary>
public class TypingTests
{
    /// <summary>Prefixes per sample file: one per stride, at a seeded random offset inside it, plus every line end.</summary>
    private const int PrefixesPerFile = 30;

    /// <summary>Mutated variants per sample file.</summary>
    private const int MutationsPerFile = 230;

    public static IEnumerable<object[]> SampleFiles() => BoundedAnalysis.Samples.Select(s => new object[] { s.Path });

    [Theory]
    [MemberData(nameof(SampleFiles))]
    public async Task EveryPrefixOfASampleAsTyped(string path)
    {
        var (baseline, tree, text) = Setup(path);
        var random = new Random(Seed(path));
        var cuts = new SortedSet<int> { 0, text.Length };
        var stride = Math.Max(1, text.Length / PrefixesPerFile);
        for (var start = 0; start < text.Length; start += stride)
            cuts.Add(Math.Min(text.Length, start + random.Next(stride)));
        for (var i = text.IndexOf('\n'); i >= 0; i = text.IndexOf('\n', i + 1))
            if (random.Next(3) == 0)
                cuts.Add(i);

        foreach (var cut in cuts)
            await AnalyseVariant(baseline, tree, text.Substring(0, cut), $"{path} cut at {cut} of {text.Length}");
    }

    /// <summary>
    /// Set to the value a failure message gives ("File.cs:choice,choice,...") to analyse exactly that mutation, and no
    /// other: a failure is reproduced without the random draw. (CsCheck_Seed, from CsCheck's own message, replays its
    /// shrunk case as the first variant of a full run.)
    /// </summary>
    public const string ReplayVariable = "PHASEWARD_TYPING_MUTATION";

    // The mutations are drawn by CsCheck from a choice sequence (Phaseward.Tests' ChoiceSequence): a mutation that makes
    // an analyzer fail is shrunk to fewer, earlier edits and reported with the seed that reproduces it (CsCheck_Seed).
    // The choices are the mutation's own seed: every failure message names them and the edits they make, so a failure
    // that never reaches CsCheck's report (a hang, a crashed test host) can still be replayed through ReplayVariable.
    [Theory]
    [MemberData(nameof(SampleFiles))]
    public void RandomTokenMutationsOfASample(string path)
    {
        var (baseline, tree, _) = Setup(path);
        SampleMutations(path, (variant, what) => AnalyseVariant(baseline, tree, variant, what).GetAwaiter().GetResult());
    }

    /// <summary>
    /// Mutations the random draw once found failing, replayed from the seed their failure message gave (the edits depend on
    /// the sample's text: if it changes, these become other mutations, still checked the same way).
    /// </summary>
    [Theory]
    [InlineData("Housekeeping.cs:694270,613676,178313,204947,755262,691529,680847")] // 'bit < $"...': FormatException inside the elaborator
    [InlineData("StrainLanes.cs:1024346,812870,448986,56392,203150,364757,568003,996586,80545")] // a comparison with "strict"
    [InlineData("Housekeeping.cs:351077,74149,563087,347902,12589,288699,573986,226919,64039")] // 'for (var bit = 0; ; ...': an endless ripple of registers, past 30 s
    public async Task AMutationThatOnceFailedStaysFixed(string seed)
    {
        var (file, choices) = ParseReplay(seed);
        var path = BoundedAnalysis.Samples.Single(s => s.Path.EndsWith("/" + file, StringComparison.Ordinal)).Path;
        var (baseline, tree, text) = Setup(path);
        var (variant, edits) = Mutate(new ChoiceSequence(choices), text, Tokens(tree));
        await AnalyseVariant(baseline, tree, variant, $"{path} mutation:{edits} (seed {ReplayVariable}={seed})");
    }

    /// <summary>A failure names the mutation's choices and edits, and replaying those choices makes the same variant.</summary>
    [Fact]
    public void AFailingMutationIsNamedWithItsSeedAndEdits()
    {
        var path = BoundedAnalysis.Samples[0].Path;
        var failing = new List<(string Variant, string What)>();
        var failure = Assert.ThrowsAny<Exception>(() => SampleMutations(path, (variant, what) =>
        {
            if (!what.Contains(" delete ", StringComparison.Ordinal)) return;
            failing.Add((variant, what));
            throw new InvalidOperationException("analysis failed on " + what);
        }));

        var message = failure.ToString();
        var seed = Regex.Match(message, ReplayVariable + "=(?<value>[^)\\s]+)");
        Assert.True(seed.Success, "no seed in the failure:\n" + message);
        Assert.Contains(" delete '", message, StringComparison.Ordinal);
        var (file, choices) = ParseReplay(seed.Groups["value"].Value);
        Assert.Equal(path.Substring(path.LastIndexOf('/') + 1), file);

        // Replayed, the seed makes a variant that fails again (the one CsCheck reported after shrinking).
        var (_, tree, text) = Setup(path);
        var tokens = Tokens(tree);
        var (replayed, edits) = Mutate(new ChoiceSequence(choices), text, tokens);
        Assert.Contains(" delete '", edits, StringComparison.Ordinal);
        Assert.Contains(failing, f => f.Variant == replayed);
    }

    [Theory]
    [InlineData("WakeLogic.cs", "the form File.cs:choice")]
    [InlineData("WakeLogic.cs:1,x", "'x' is not a choice")]
    [InlineData("WakeLogic.cs:-3", "'-3' is not a choice")]
    public void AReplayValueThatCannotBeReadNamesTheVariableAndTheValue(string value, string expected)
    {
        var error = Assert.Throws<ArgumentException>(() => ParseReplay(value));
        Assert.Contains(ReplayVariable + "='" + value.Split(':')[0], error.Message, StringComparison.Ordinal);
        Assert.Contains(expected, error.Message, StringComparison.Ordinal);
    }

    /// <summary>
    /// Draws the mutations of one sample file (or, with <see cref="ReplayVariable"/> set, only the one it names) and hands
    /// each variant to <paramref name="analyse"/> with a description that carries its seed and edits.
    /// </summary>
    private static void SampleMutations(string path, Action<string, string> analyse)
    {
        var (_, tree, text) = Setup(path);
        var tokens = Tokens(tree);
        var file = path.Substring(path.LastIndexOf('/') + 1);
        if (Environment.GetEnvironmentVariable(ReplayVariable) is { Length: > 0 } replay)
        {
            var (replayFile, replayChoices) = ParseReplay(replay);
            if (replayFile == file)
                Analyse(replayChoices);
            return;
        }

        ChoiceSequence.Of(12).Sample(Analyse, iter: MutationsPerFile, threads: 1, print: Describe);

        void Analyse(int[] choices) => analyse(Mutate(new ChoiceSequence(choices), text, tokens).Variant, path + " " + Describe(choices));

        string Describe(int[] choices)
            => "mutation:" + Mutate(new ChoiceSequence(choices), text, tokens).Describe
                + $" (seed {ReplayVariable}={file}:{string.Join(",", choices)})";
    }

    private static List<SyntaxToken> Tokens(SyntaxTree tree) => tree.GetRoot().DescendantTokens().Where(t => t.Span.Length > 0).ToList();

    /// <summary>"File.cs:1,2,3" into the file name and the choices; a clear error naming the variable and the value otherwise.</summary>
    internal static (string File, int[] Choices) ParseReplay(string value)
    {
        var colon = value.LastIndexOf(':');
        var choices = new List<int>();
        if (colon > 0)
            foreach (var part in value.Substring(colon + 1).Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
                choices.Add(int.TryParse(part, System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out var choice)
                    ? choice
                    : throw new ArgumentException($"{ReplayVariable}='{value}': '{part}' is not a choice (a whole number from 0)", nameof(value)));
        if (colon <= 0)
            throw new ArgumentException($"{ReplayVariable}='{value}' is not of the form File.cs:choice,choice,... (as a failure message prints it)", nameof(value));
        return (value.Substring(0, colon), choices.ToArray());
    }

    /// <summary>One to three token edits (delete, duplicate, replace, insert, swap with the next token).</summary>
    private static (string Variant, string Describe) Mutate(Random random, string text, List<SyntaxToken> tokens)
    {
        var edits = new List<(int Start, int Length, string Text)>();
        var count = 1 + random.Next(3);
        var describe = new StringBuilder();
        for (var k = 0; k < count; k++)
        {
            var token = tokens[random.Next(tokens.Count)];
            var other = tokens[random.Next(tokens.Count)].Text;
            switch (random.Next(5))
            {
                case 0: edits.Add((token.SpanStart, token.Span.Length, "")); describe.Append($" delete '{token.Text}'@{token.SpanStart}"); break;
                case 1: edits.Add((token.SpanStart, 0, token.Text + " ")); describe.Append($" duplicate '{token.Text}'@{token.SpanStart}"); break;
                case 2: edits.Add((token.SpanStart, token.Span.Length, other)); describe.Append($" replace '{token.Text}'@{token.SpanStart} by '{other}'"); break;
                case 3: edits.Add((token.SpanStart, 0, other + " ")); describe.Append($" insert '{other}'@{token.SpanStart}"); break;
                default:
                    var next = token.GetNextToken();
                    if (next.Span.Length == 0) goto case 0;
                    edits.Add((token.SpanStart, next.Span.End - token.SpanStart, next.Text + text.Substring(token.Span.End, next.SpanStart - token.Span.End) + token.Text));
                    describe.Append($" swap '{token.Text}' '{next.Text}'@{token.SpanStart}");
                    break;
            }
        }

        return (Apply(text, edits), describe.ToString());
    }

    private static async Task AnalyseVariant(CSharpCompilation baseline, SyntaxTree original, string variant, string what)
    {
        var tree = BoundedAnalysis.Parse(original.FilePath, variant);
        var compilation = baseline.ReplaceSyntaxTree(original, tree);
        await BoundedAnalysis.DocumentAsync(compilation, tree, what);

        // A file without a design (the process figures, the program) is typed while designs that use it are open.
        if (!variant.Contains("Describe", StringComparison.Ordinal))
        {
            var design = compilation.SyntaxTrees.First(t => t.FilePath.EndsWith("BurstCapture.cs", StringComparison.Ordinal));
            await BoundedAnalysis.DocumentAsync(compilation, design, what + " (BurstCapture.cs analysed)");
        }
    }

    private static (CSharpCompilation Baseline, SyntaxTree Tree, string Text) Setup(string path)
    {
        var trees = BoundedAnalysis.Samples.Select(s => BoundedAnalysis.Parse(s.Path, s.Text)).ToList();
        var tree = trees.Single(t => t.FilePath == path);
        return (BoundedAnalysis.Compile(trees), tree, tree.ToString());
    }

    /// <summary>Applies non-overlapping edits (overlapping ones after the first are dropped), from the end backwards.</summary>
    private static string Apply(string text, List<(int Start, int Length, string Text)> edits)
    {
        var kept = new List<(int Start, int Length, string Text)>();
        foreach (var edit in edits.OrderBy(e => e.Start))
            if (kept.Count == 0 || edit.Start >= kept[^1].Start + kept[^1].Length && edit.Start != kept[^1].Start)
                kept.Add(edit);
        var result = new StringBuilder(text);
        foreach (var edit in Enumerable.Reverse(kept))
        {
            result.Remove(edit.Start, edit.Length);
            result.Insert(edit.Start, edit.Text);
        }

        return result.ToString();
    }

    private static int Seed(string path)
    {
        var seed = 17;
        foreach (var ch in path)
            seed = unchecked(seed * 31 + ch);
        return seed;
    }
}
