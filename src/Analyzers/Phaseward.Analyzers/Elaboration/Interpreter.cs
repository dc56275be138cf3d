using System;
using System.Collections.Concurrent;
using System.Collections.Generic;
using System.Linq;
using System.Threading;
using Microsoft.CodeAnalysis;
using Phaseward.Checking;
using Phaseward.Netlists;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// Interprets a design's C# over Roslyn's IOperation tree (see the partial files for statements, expressions, calls,
/// assignments, patterns and collections). Values are real .NET objects; DSL calls are made for real by reflection,
/// with the circuit told where each call was written. What it cannot interpret is reported once (PW9001) and yields
/// <see cref="Unknown"/>, which silently poisons everything computed from it.
/// </summary>
internal sealed partial class Interpreter
{
    private readonly ElaborationSession session;
    private readonly ElaborationLimits limits;
    private readonly CancellationToken cancellationToken;
    private readonly List<ElaborationIssue> issues = new();
    private readonly HashSet<(string Path, int Start, int OuterStart)> reportedSites = new();
    private readonly Dictionary<ISymbol, Variable> statics = new(SymbolEqualityComparer.Default);
    private readonly HashSet<INamedTypeSymbol> initializedTypes = new(SymbolEqualityComparer.Default);
    private readonly Stack<IOperation> loops = new();
    private readonly Stack<object> implicitReceivers = new();
    private readonly Stack<object> conditionalReceivers = new();
    private readonly Stack<object?> patternInputs = new();
    private SourceSpan[] callers = Array.Empty<SourceSpan>();
    private int depth;

    // How many try statements enclose the code being interpreted: inside one, an exception is thrown for the design's
    // catch clauses (DesignException); outside, it is PW9003 at once.
    private int tryDepth;

    // The exceptions being handled by catch clauses (innermost last), for 'throw;'.
    private readonly Stack<object> caught = new();

    // Resources of 'using var' declarations, per block that has them (innermost last): disposed when the block ends.
    private readonly Stack<List<object?>> usingScopes = new();

    // Bytes charged against the memory budget (see ChargeMemory).
    private long allocatedBytes;

    public Interpreter(ElaborationSession session, string designName, ElaborationLimits limits, CancellationToken cancellationToken)
    {
        this.session = session;
        DesignName = designName;
        this.limits = limits;
        this.cancellationToken = cancellationToken;
    }

    /// <summary>The design's name (for messages); updated once the design's Name property is known.</summary>
    public string DesignName { get; set; }

    /// <summary>The circuit DSL calls go to (null while constructing the design).</summary>
    public Circuit? Circuit { get; set; }

    /// <summary>When set, nothing is reported (used to probe whether constructor arguments are known).</summary>
    public bool Silent
    {
        get => silent;
        set
        {
            // Static state made while nothing was reported is forgotten: made again later, its problems are reported.
            if (silent && !value)
            {
                statics.Clear();
                initializedTypes.Clear();
            }

            silent = value;
        }
    }

    private bool silent;

    public long Steps { get; private set; }

    public IReadOnlyList<ElaborationIssue> Issues => issues;

    /// <summary>The operation being interpreted, for reporting an unexpected failure of the interpreter itself.</summary>
    public IOperation? Current { get; private set; }

    /// <summary>The call chain as it stands, outermost call first.</summary>
    public IReadOnlyList<SourceSpan> Callers => callers;

    // ---- reporting ----

    /// <summary>Reports PW9001 once for this site and returns <see cref="Unknown"/>.</summary>
    public object Unsupported(IOperation operation, string what, string why)
    {
        Report(RuleCatalog.NotElaborated.Id, operation.Syntax, what, why, DesignName);
        return Unknown.Value;
    }

    /// <summary>
    /// How many exceptions the design may throw (and the elaborator step over) before elaboration stops. At run time the
    /// first one ends Describe; stepping over a few keeps the rest of the design checked, but a loop that throws on
    /// every iteration would otherwise spend its whole step budget in exception handling.
    /// </summary>
    public const int MaxThrows = 100;

    private int throws;

    /// <summary>Reports PW9003 at the site: the design throws here when it runs.</summary>
    public void Throws(SyntaxNode site, string message)
    {
        if (tryDepth > 0)
            throw new DesignException(ExceptionNamed(message), site);
        Report(RuleCatalog.DesignThrows.Id, site, DesignName, message);
        if (++throws >= MaxThrows && !Silent)
            throw new ElaborationStopped();
    }

    public void Report(string ruleId, SyntaxNode site, params string[] arguments)
    {
        if (Silent)
            return;
        var span = SourceSites.For(site, callers);
        var key = (span.Path, span.Start, callers.Length > 0 ? callers[0].Start : -1);
        if (reportedSites.Add(key))
            issues.Add(new ElaborationIssue(ruleId, span, arguments));
    }

    // ---- budgets ----

    /// <summary>Counts one step (a loop iteration or a call) and honours cancellation.</summary>
    private void Step(IOperation site)
    {
        cancellationToken.ThrowIfCancellationRequested();
        if (++Steps > limits.StepBudget)
        {
            var where = loops.Count > 0 ? loops.Peek() : site;
            Report(RuleCatalog.ElaborationBudgetExceeded.Id, where.Syntax, DesignName,
                $"the step budget of {limits.StepBudget} steps (loop iterations and calls; phaseward.elaboration_step_budget) is used up");
            throw new ElaborationStopped();
        }
    }

    private void EnterCall(IOperation site)
    {
        if (++depth > limits.RecursionLimit || !HasStackRoom())
        {
            depth--;
            Report(RuleCatalog.ElaborationBudgetExceeded.Id, site.Syntax, DesignName,
                $"calls nest deeper than the limit of {limits.RecursionLimit} (phaseward.elaboration_recursion_limit)");
            throw new ElaborationStopped();
        }
    }

    private void LeaveCall() => depth--;

    private static bool HasStackRoom()
    {
        try
        {
            System.Runtime.CompilerServices.RuntimeHelpers.EnsureSufficientExecutionStack();
            return true;
        }
        catch (InsufficientExecutionStackException)
        {
            return false;
        }
    }

    // Chains are interned by (outer chain, call site): a helper called from the same place in every loop iteration
    // gets the same chain array each time, so the spans made under it can be shared too (see CurrentClrSite).
    private readonly Dictionary<(SourceSpan[] Outer, SyntaxNode Site), SourceSpan[]> chains = new();

    private void PushCaller(SyntaxNode site)
    {
        if (!chains.TryGetValue((callers, site), out var next))
        {
            next = new SourceSpan[callers.Length + 1];
            Array.Copy(callers, next, callers.Length);
            next[callers.Length] = SourceSites.For(site, callers);
            chains.Add((callers, site), next);
        }

        callers = next;
    }

    private SemanticModel ModelOf(SyntaxNode node) => session.Models.Get(node.SyntaxTree);

    private static string Describe(ISymbol symbol) => "'" + symbol.ToDisplayString(SymbolDisplayFormat.CSharpShortErrorMessageFormat) + "'";
}

/// <summary>Per-compilation state the interpreter needs: semantic models, designs, cached method bodies.</summary>
internal sealed class ElaborationSession
{
    private readonly ConcurrentDictionary<ISymbol, IOperation?> bodies = new(SymbolEqualityComparer.Default);
    private readonly ConcurrentDictionary<IMethodSymbol, System.Reflection.MethodBase?> members = new(SymbolEqualityComparer.Default);
    private readonly ConcurrentDictionary<System.Reflection.MethodBase, Type[]> parameterTypes = new();

    public ElaborationSession(Compilation compilation, INamedTypeSymbol designType)
    {
        Compilation = compilation;
        DesignType = designType;
        Models = new SemanticModelProvider(compilation);
        Catalog = new DesignCatalog(compilation, designType, Models);
    }

    public Compilation Compilation { get; }

    public INamedTypeSymbol DesignType { get; }

    public SemanticModelProvider Models { get; }

    public DesignCatalog Catalog { get; }

    /// <summary><c>Phaseward.Block.Describe</c>, which every block overrides (null if the referenced DSL has no Block).</summary>
    public IMethodSymbol? BlockDescribe => blockDescribe ??= Compilation.GetTypeByMetadataName("Phaseward.Block")?.GetMembers("Describe").OfType<IMethodSymbol>().FirstOrDefault();

    private IMethodSymbol? blockDescribe;

    /// <summary>The syntax tree with the given path (null if none).</summary>
    public SyntaxTree? TreeAt(string path)
    {
        var trees = treesByPath ??= BuildTreeIndex();
        return trees.TryGetValue(path, out var tree) ? tree : null;
    }

    private Dictionary<string, SyntaxTree>? treesByPath;

    private Dictionary<string, SyntaxTree> BuildTreeIndex()
    {
        var index = new Dictionary<string, SyntaxTree>(StringComparer.Ordinal);
        foreach (var tree in Compilation.SyntaxTrees)
            if (!index.ContainsKey(tree.FilePath))
                index.Add(tree.FilePath, tree);
        return index;
    }

    public bool IsInSource(ISymbol symbol)
        => SymbolEqualityComparer.Default.Equals(symbol.ContainingAssembly, Compilation.Assembly) && symbol.DeclaringSyntaxReferences.Length > 0;

    /// <summary>The run-time member behind a DSL or library method symbol (cached per symbol of this compilation).</summary>
    public System.Reflection.MethodBase? MemberOf(IMethodSymbol method) => members.GetOrAdd(method, DslMembers.Find);

    /// <summary>The parameter types of a run-time member (MethodBase.GetParameters copies its array on every call).</summary>
    public Type[] ParameterTypesOf(System.Reflection.MethodBase member)
        => parameterTypes.GetOrAdd(member, m => m.GetParameters().Select(p => p.ParameterType).ToArray());

    /// <summary>The run-time member behind a pure library method symbol, on its erased type (see <see cref="Library"/>).</summary>
    public System.Reflection.MethodBase? LibraryMemberOf(IMethodSymbol method) => Library.Find(method);

    public IOperation? BodyOf(ISymbol method, Func<ISymbol, IOperation?> factory) => bodies.GetOrAdd(method.OriginalDefinition, factory);
}
