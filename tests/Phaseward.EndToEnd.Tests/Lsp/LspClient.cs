using System;
using System.Collections.Concurrent;
using System.Collections.Generic;
using System.Diagnostics;
using System.IO;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using System.Threading;
using System.Threading.Tasks;

namespace Phaseward.EndToEnd.Tests.Lsp;

/// <summary>
/// A minimal Language Server Protocol client over stdio: enough to open a document, edit it and pull its diagnostics
/// the way an editor does. It answers the server's <c>workspace/configuration</c> requests with analyzers enabled.
/// </summary>
internal sealed class LspClient : IAsyncDisposable
{
    private readonly System.Diagnostics.Process server;
    private readonly ConcurrentDictionary<int, TaskCompletionSource<JsonNode?>> pending = new();
    private readonly StringBuilder log = new();
    private readonly Task readLoop;
    private int nextId;

    private LspClient(System.Diagnostics.Process server)
    {
        this.server = server;
        readLoop = Task.Run(ReadLoopAsync);
    }

    /// <summary>What the server logged and any protocol trouble, for assertion messages.</summary>
    public string Log { get { lock (log) return log.ToString(); } }

    /// <summary>Starts the server as a local .NET tool (pinned in .config/dotnet-tools.json) in <paramref name="workspace"/>.</summary>
    public static async Task<LspClient> StartAsync(string workspace, string toolManifestDirectory, CancellationToken cancellationToken)
    {
        var start = new ProcessStartInfo("dotnet", "tool run csharp-ls -- --loglevel info")
        {
            WorkingDirectory = workspace,
            RedirectStandardInput = true,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        start.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        start.Environment["DOTNET_NOLOGO"] = "1";
        // `dotnet tool run` finds the manifest by walking up from the working directory; the workspace is a temp folder,
        // so point it at the repository's manifest by copying it in.
        var manifest = Path.Combine(toolManifestDirectory, ".config", "dotnet-tools.json");
        Directory.CreateDirectory(Path.Combine(workspace, ".config"));
        File.Copy(manifest, Path.Combine(workspace, ".config", "dotnet-tools.json"), overwrite: true);

        var process = System.Diagnostics.Process.Start(start) ?? throw new InvalidOperationException("could not start csharp-ls");
        var client = new LspClient(process);
        process.ErrorDataReceived += (_, e) => { if (e.Data is not null) client.Append("stderr: " + e.Data); };
        process.BeginErrorReadLine();

        var rootUri = new Uri(workspace + Path.DirectorySeparatorChar).AbsoluteUri;
        await client.RequestAsync("initialize", new JsonObject
        {
            ["processId"] = Environment.ProcessId,
            ["rootUri"] = rootUri,
            ["workspaceFolders"] = new JsonArray(new JsonObject { ["uri"] = rootUri, ["name"] = "design" }),
            ["capabilities"] = new JsonObject
            {
                ["workspace"] = new JsonObject { ["configuration"] = true },
                ["textDocument"] = new JsonObject
                {
                    ["diagnostic"] = new JsonObject { ["dynamicRegistration"] = false },
                    ["publishDiagnostics"] = new JsonObject(),
                },
            },
        }, cancellationToken);
        await client.NotifyAsync("initialized", new JsonObject());
        await client.NotifyAsync("workspace/didChangeConfiguration", new JsonObject { ["settings"] = AnalyzersEnabled() });
        return client;
    }

    public Task OpenAsync(string path, string text)
        => NotifyAsync("textDocument/didOpen", new JsonObject
        {
            ["textDocument"] = new JsonObject { ["uri"] = Uri(path), ["languageId"] = "csharp", ["version"] = 1, ["text"] = text },
        });

    /// <summary>Replaces the whole document text, as an editor does after a keystroke.</summary>
    public Task ChangeAsync(string path, int version, string text)
        => NotifyAsync("textDocument/didChange", new JsonObject
        {
            ["textDocument"] = new JsonObject { ["uri"] = Uri(path), ["version"] = version },
            ["contentChanges"] = new JsonArray(new JsonObject { ["text"] = text }),
        });

    /// <summary>Pulls the document's diagnostics until <paramref name="done"/> holds or the time runs out; returns the last set.</summary>
    public async Task<IReadOnlyList<LspDiagnostic>> PullDiagnosticsUntilAsync(string path, Func<IReadOnlyList<LspDiagnostic>, bool> done, TimeSpan timeout, CancellationToken cancellationToken)
    {
        var deadline = DateTime.UtcNow + timeout;
        IReadOnlyList<LspDiagnostic> last = Array.Empty<LspDiagnostic>();
        while (DateTime.UtcNow < deadline)
        {
            var result = await RequestAsync("textDocument/diagnostic", new JsonObject { ["textDocument"] = new JsonObject { ["uri"] = Uri(path) } }, cancellationToken);
            last = LspDiagnostic.ListFrom(result?["items"] as JsonArray);
            if (done(last))
                return last;
            await Task.Delay(TimeSpan.FromSeconds(2), cancellationToken);
        }

        return last;
    }

    public async ValueTask DisposeAsync()
    {
        try
        {
            using var shutdownTimeout = new CancellationTokenSource(TimeSpan.FromSeconds(10));
            await RequestAsync("shutdown", null, shutdownTimeout.Token);
            await NotifyAsync("exit", null);
        }
        catch (Exception e) when (e is OperationCanceledException or IOException or InvalidOperationException)
        {
            // The server may already be gone; it is killed below either way.
        }

        if (!server.WaitForExit(5000))
            server.Kill(entireProcessTree: true);
        server.Dispose();
        await Task.WhenAny(readLoop, Task.Delay(2000));
    }

    private static JsonObject AnalyzersEnabled() => new() { ["csharp"] = new JsonObject { ["analyzersEnabled"] = true } };

    private static string Uri(string path) => new Uri(Path.GetFullPath(path)).AbsoluteUri;

    private async Task<JsonNode?> RequestAsync(string method, JsonNode? parameters, CancellationToken cancellationToken)
    {
        var id = Interlocked.Increment(ref nextId);
        var completion = new TaskCompletionSource<JsonNode?>(TaskCreationOptions.RunContinuationsAsynchronously);
        pending[id] = completion;
        await SendAsync(new JsonObject { ["jsonrpc"] = "2.0", ["id"] = id, ["method"] = method, ["params"] = parameters });
        using (cancellationToken.Register(() => completion.TrySetCanceled()))
            return await completion.Task;
    }

    private Task NotifyAsync(string method, JsonNode? parameters)
        => SendAsync(new JsonObject { ["jsonrpc"] = "2.0", ["method"] = method, ["params"] = parameters });

    private async Task SendAsync(JsonObject message)
    {
        var body = Encoding.UTF8.GetBytes(message.ToJsonString());
        var header = Encoding.ASCII.GetBytes($"Content-Length: {body.Length}\r\n\r\n");
        var stream = server.StandardInput.BaseStream;
        await stream.WriteAsync(header);
        await stream.WriteAsync(body);
        await stream.FlushAsync();
    }

    private async Task ReadLoopAsync()
    {
        var stream = server.StandardOutput.BaseStream;
        try
        {
            while (true)
            {
                var length = await ReadContentLengthAsync(stream);
                if (length < 0) break;
                var body = new byte[length];
                await stream.ReadExactlyAsync(body);
                Dispatch(JsonNode.Parse(body)!.AsObject());
            }
        }
        catch (Exception e) when (e is IOException or ObjectDisposedException or EndOfStreamException or JsonException)
        {
            Append("read loop ended: " + e.Message);
        }

        foreach (var waiting in pending.Values)
            waiting.TrySetException(new IOException("csharp-ls closed the connection. Log:\n" + Log));
    }

    private void Dispatch(JsonObject message)
    {
        var hasId = message.TryGetPropertyValue("id", out var idNode) && idNode is not null;
        if (message["method"] is JsonNode methodNode)
        {
            var method = methodNode.GetValue<string>();
            if (method == "window/logMessage") Append(message["params"]?["message"]?.GetValue<string>() ?? string.Empty);
            if (hasId) _ = SendAsync(new JsonObject { ["jsonrpc"] = "2.0", ["id"] = idNode!.DeepClone(), ["result"] = AnswerServerRequest(method, message["params"]) });
            return;
        }

        if (hasId && pending.TryRemove(idNode!.GetValue<int>(), out var completion))
        {
            if (message["error"] is JsonNode error) completion.TrySetException(new InvalidOperationException("LSP error: " + error.ToJsonString()));
            else completion.TrySetResult(message["result"]?.DeepClone());
        }
    }

    private static JsonNode? AnswerServerRequest(string method, JsonNode? parameters)
    {
        if (method != "workspace/configuration") return null;
        var answers = new JsonArray();
        foreach (var item in parameters?["items"] as JsonArray ?? new JsonArray())
        {
            var section = item?["section"]?.GetValue<string>();
            answers.Add(section switch
            {
                "csharp" => new JsonObject { ["analyzersEnabled"] = true },
                "csharp.analyzersEnabled" => JsonValue.Create(true),
                _ => null,
            });
        }

        return answers;
    }

    private static async Task<int> ReadContentLengthAsync(Stream stream)
    {
        var length = -1;
        var line = new StringBuilder();
        var buffer = new byte[1];
        while (true)
        {
            if (await stream.ReadAsync(buffer) == 0) return -1;
            if (buffer[0] == '\n')
            {
                var text = line.ToString().TrimEnd('\r');
                line.Clear();
                if (text.Length == 0) return length;
                if (text.StartsWith("Content-Length:", StringComparison.OrdinalIgnoreCase))
                    length = int.Parse(text.Substring("Content-Length:".Length).Trim(), System.Globalization.CultureInfo.InvariantCulture);
            }
            else
            {
                line.Append((char)buffer[0]);
            }
        }
    }

    private void Append(string line)
    {
        lock (log) log.AppendLine(line);
    }
}

/// <summary>One diagnostic as the server reports it (0-based line and character, as LSP counts).</summary>
internal sealed record LspDiagnostic(string Code, int Line, int Character, int EndLine, int EndCharacter, string Message)
{
    public static IReadOnlyList<LspDiagnostic> ListFrom(JsonArray? items)
    {
        var list = new List<LspDiagnostic>();
        foreach (var item in items ?? new JsonArray())
        {
            if (item is null) continue;
            var range = item["range"]!;
            var code = item["code"] is JsonValue value ? value.ToString() : string.Empty;
            list.Add(new LspDiagnostic(code,
                range["start"]!["line"]!.GetValue<int>(), range["start"]!["character"]!.GetValue<int>(),
                range["end"]!["line"]!.GetValue<int>(), range["end"]!["character"]!.GetValue<int>(),
                item["message"]?.GetValue<string>() ?? string.Empty));
        }

        return list;
    }
}
