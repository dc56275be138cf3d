using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Operations;
using Phaseward.Analyzers.Elaboration;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// The interpreter's shape (DEVELOPERS.md, "Where an operation kind is interpreted"): one dispatch on OperationKind in
/// Interpreter.Dispatch.cs, each case one call to the method named after its kind, no second dispatch; and a kind it
/// does not interpret is PW9001 naming the construct.
/// </summary>
public class InterpreterDispatchTests
{
    private static readonly string Folder = Repository.PathOf("src", "Analyzers", "Phaseward.Analyzers", "Elaboration");

    /// <summary>
    /// Methods that branch on the shape of an operation for a purpose other than interpreting it, each with why. Any
    /// other switch over operation types is a second dispatch: put the case in Interpreter.Dispatch.cs instead.
    /// </summary>
    private static readonly Dictionary<string, string> ShapeSwitches = new(StringComparer.Ordinal)
    {
        ["PlaceOf"] = "where an assignment target stores its value (not its value)",
        ["VariableOf"] = "the variable a ref/out argument denotes",
        ["Deconstruct"] = "the targets of a deconstruction",
        ["PlacesOf"] = "where the targets of a deconstruction store their parts, found before the value is evaluated",
        ["Poison"] = "which variables skipped code may have assigned (it is not run)",
        ["IsVariable"] = "whether a struct method's receiver is a variable or a value (it then runs on a copy)",
        ["VariableNamed"] = "the variable a name denotes, for skipped code and calls that could not be made (not its value)",
        ["ReferencedSymbol"] = "the symbol an assignment target or a ref argument names (not its value)",
        ["JumpOutOf"] = "how a statement of skipped code may jump out of it (it is not run)",
        ["TargetInside"] = "whether a break or continue of skipped code targets a loop or switch inside it",
        ["InitializerOf"] = "the value of a field's or property's initializer found by its declaration",
        ["BodyOf"] = "the body of a method found by its declaration",
        ["Construct"] = "the ': this(...)'/': base(...)' initializer of a constructor",
        ["RunForEachBody"] = "the loop variable of one foreach (a declared variable or a deconstruction)",
        ["VisitSwitch"] = "the clauses of one switch statement (case value, pattern, default)",
        ["InterpolateParts"] = "the text and holes of one interpolated string",
        ["VisitUsing"] = "the resources of one using statement (declarations or a value)",
        ["VisitDelegateCreation"] = "what one delegate is made from (lambda or method group)",
    };

    [Fact]
    public void EveryCaseOfTheOneDispatchCallsTheMethodNamedAfterItsKind()
    {
        var dispatch = TheDispatch();
        var kinds = new HashSet<string>(StringComparer.Ordinal);
        foreach (var section in dispatch.Sections)
        {
            Assert.True(section.Labels.Count == 1, $"'{section.Labels}' shares one case: give each kind its own Visit<Kind>");
            var label = section.Labels[0];
            Assert.True(section.Statements is [ReturnStatementSyntax { Expression: InvocationExpressionSyntax { Expression: IdentifierNameSyntax } }],
                $"'{label}' is not one 'return Visit<Kind>(...)': put its code in the visit method");
            var call = (InvocationExpressionSyntax)((ReturnStatementSyntax)section.Statements[0]).Expression!;
            var called = ((IdentifierNameSyntax)call.Expression).Identifier.Text;
            if (label is DefaultSwitchLabelSyntax)
            {
                Assert.Equal("NotInterpreted", called);
                continue;
            }

            var kind = Assert.IsType<MemberAccessExpressionSyntax>(Assert.IsType<CaseSwitchLabelSyntax>(label).Value).Name.Identifier.Text;
            Assert.True(Enum.IsDefined(typeof(OperationKind), kind), kind + " is not an OperationKind");
            Assert.True(kinds.Add(kind), kind + " has two cases");
            Assert.True(called == "Visit" + kind, $"case OperationKind.{kind} calls {called}, not Visit{kind}");
            var argument = call.ArgumentList.Arguments[0].Expression;
            Assert.True(argument is CastExpressionSyntax { Expression: IdentifierNameSyntax { Identifier.Text: "operation" } },
                $"case OperationKind.{kind} passes '{argument}', not the operation itself");
        }

        Assert.Contains(dispatch.Sections, s => s.Labels.Single() is DefaultSwitchLabelSyntax);
        Assert.True(kinds.Count > 60, "the dispatch handles " + kinds.Count + " kinds");

        // Exactly one method per kind, declared once (reflection sees every partial file).
        var methods = typeof(Interpreter).GetMethods(System.Reflection.BindingFlags.Instance | System.Reflection.BindingFlags.NonPublic);
        foreach (var kind in kinds)
            Assert.True(methods.Count(m => m.Name == "Visit" + kind) == 1, "Visit" + kind + " is not declared exactly once");
    }

    [Fact]
    public void EveryVisitMethodIsAKindOfTheDispatchAndIsCalledOnlyFromIt()
    {
        var handled = TheDispatch().Sections.SelectMany(s => s.Labels).OfType<CaseSwitchLabelSyntax>()
            .Select(l => "Visit" + ((MemberAccessExpressionSyntax)l.Value).Name.Identifier.Text).ToHashSet(StringComparer.Ordinal);
        // The loops share OperationKind.Loop: VisitLoop hands each LoopKind to Visit<LoopKind>Loop.
        var loops = Enum.GetNames(typeof(LoopKind)).Select(k => "Visit" + k + "Loop").ToHashSet(StringComparer.Ordinal);

        foreach (var (file, root) in InterpreterFiles())
        {
            foreach (var method in root.DescendantNodes().OfType<MethodDeclarationSyntax>().Where(m => m.Identifier.Text.StartsWith("Visit", StringComparison.Ordinal)))
            {
                var name = method.Identifier.Text;
                Assert.True(name == "Visit" || handled.Contains(name) || loops.Contains(name),
                    $"{file}: {name} is named like a visit method but no case of the dispatch calls it");
            }

            foreach (var call in root.DescendantNodes().OfType<InvocationExpressionSyntax>())
            {
                if (call.Expression is not IdentifierNameSyntax { Identifier.Text: var name } || !name.StartsWith("Visit", StringComparison.Ordinal) || name == "Visit")
                    continue;
                var caller = call.FirstAncestorOrSelf<MethodDeclarationSyntax>()?.Identifier.Text;
                Assert.True(caller == "Visit" || (caller == "VisitLoop" && loops.Contains(name)),
                    $"{file}: {caller} calls {name} directly; go through Evaluate, Execute or Match so the one dispatch decides");
            }
        }
    }

    [Fact]
    public void ThereIsNoSecondDispatch()
    {
        var dispatches = new List<string>();
        var typeSwitches = new List<string>();
        foreach (var (file, root) in InterpreterFiles())
        {
            foreach (var node in root.DescendantNodes())
            {
                var method = node.FirstAncestorOrSelf<MethodDeclarationSyntax>()?.Identifier.Text ?? "(none)";
                var (governing, patterns, arms) = node switch
                {
                    SwitchStatementSyntax s => (s.Expression, s.Sections.SelectMany(x => x.Labels).Select(PatternOf), s.Sections.SelectMany(x => x.Statements).Cast<SyntaxNode>()),
                    SwitchExpressionSyntax e => (e.GoverningExpression, e.Arms.Select(a => (SyntaxNode?)a.Pattern), e.Arms.Select(a => (SyntaxNode)a.Expression)),
                    _ => (null, Enumerable.Empty<SyntaxNode?>(), Enumerable.Empty<SyntaxNode>()),
                };
                if (governing is null)
                    continue;

                // A switch on an operation's Kind that does anything but classify (calls a method in an arm) dispatches.
                if (governing is MemberAccessExpressionSyntax { Name.Identifier.Text: "Kind" }
                    && arms.Any(a => a.DescendantNodesAndSelf().OfType<InvocationExpressionSyntax>().Any()))
                    dispatches.Add($"{file}: {method} switches on {governing}");

                // A switch over operation types is a second dispatch unless it is one of the shape switches above.
                var testsOperationTypes = patterns.Any(p => p is not null && p.DescendantNodesAndSelf().OfType<IdentifierNameSyntax>()
                    .Any(n => n.Identifier.Text.StartsWith("I", StringComparison.Ordinal) && n.Identifier.Text.EndsWith("Operation", StringComparison.Ordinal)));
                if (testsOperationTypes && !ShapeSwitches.ContainsKey(method))
                    typeSwitches.Add($"{file}: {method} switches over operation types: a second dispatch (add the kind to Interpreter.Dispatch.cs)");
            }
        }

        Assert.True(typeSwitches.Count == 0, string.Join("\n", typeSwitches));
        Assert.Equal("Interpreter.Dispatch.cs: Visit switches on operation.Kind", Assert.Single(dispatches));
    }

    public static TheoryData<string, string> Unhandled() => new()
    {
        // a construct the elaborator does not interpret, the name PW9001 gives it
        { "lock (this) { count = 3; }", "a lock statement" },
        { "goto done; done: count = 3;", "a goto statement" },
        { "var pair = new { A = 3 }; count = pair.A;", "an anonymous object" },
        { "var grid = new int[2, 2]; count = grid.Length;", "a multi-dimensional array" },
    };

    [Theory]
    [MemberData(nameof(Unhandled))]
    public void AKindItDoesNotInterpretIsPW9001NamingIt(string statements, string named)
    {
        var source = $$"""
            using Phaseward;

            namespace Unhandled
            {
                public sealed class D : Design
                {
                    protected override void Describe(Circuit c)
                    {
                        var count = 0;
                        {{statements}}
                        var x = c.Input("x");
                        for (var i = 0; i < count; i++)
                            x = c.Inverter(x, "s" + i);
                        c.Output("y", x);
                    }
                }
            }
            """;
        var result = new InMemoryDesigns(("/unhandled/D.cs", source)).CompileTime("Unhandled.D");
        Assert.Contains(result.Issues, i => i.RuleId == RuleCatalog.NotElaborated.Id && i.Arguments[0] == named);
        // What depends on it is skipped, never read as a default: no inverter is made from a count of 0 or 3.
        Assert.DoesNotContain(result.Netlist!.Devices, d => d.Name.StartsWith("s", StringComparison.Ordinal));
    }

    private static SwitchStatementSyntax TheDispatch()
    {
        var root = Parse(Path.Combine(Folder, "Interpreter.Dispatch.cs"));
        var visit = root.DescendantNodes().OfType<MethodDeclarationSyntax>().Single(m => m.Identifier.Text == "Visit");
        return Assert.Single(visit.DescendantNodes().OfType<SwitchStatementSyntax>());
    }

    private static IEnumerable<(string File, SyntaxNode Root)> InterpreterFiles()
    {
        var files = Directory.GetFiles(Folder, "Interpreter*.cs");
        Assert.True(files.Length > 10, "the interpreter's partial files were not found in " + Folder);
        return files.Select(f => (Path.GetFileName(f), Parse(f)));
    }

    private static SyntaxNode Parse(string path) => CSharpSyntaxTree.ParseText(File.ReadAllText(path), path: path).GetRoot();

    private static SyntaxNode? PatternOf(SwitchLabelSyntax label) => label switch
    {
        CasePatternSwitchLabelSyntax pattern => pattern.Pattern,
        CaseSwitchLabelSyntax value => value.Value,
        _ => null,
    };
}
