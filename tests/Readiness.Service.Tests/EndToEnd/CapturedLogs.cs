using System.Collections.Concurrent;
using Microsoft.Extensions.Logging;

namespace Readiness.Service.Tests.EndToEnd;

/// <summary>Every log line the service writes, with its scopes' values and its exception, at every level.</summary>
public sealed class CapturedLogs : ILoggerProvider
{
    private readonly ConcurrentQueue<string> lines = new();
    private readonly LoggerExternalScopeProvider scopes = new();

    public IReadOnlyList<string> Lines => lines.ToArray();

    public ILogger CreateLogger(string categoryName) => new Logger(categoryName, lines, scopes);

    public void Dispose()
    {
    }

    private sealed class Logger(string category, ConcurrentQueue<string> lines, LoggerExternalScopeProvider scopes) : ILogger
    {
        public IDisposable? BeginScope<TState>(TState state)
            where TState : notnull => scopes.Push(state);

        public bool IsEnabled(LogLevel logLevel) => true;

        public void Log<TState>(LogLevel logLevel, EventId eventId, TState state, Exception? exception, Func<TState, Exception?, string> formatter)
        {
            var structured = state is IEnumerable<KeyValuePair<string, object?>> pairs
                ? string.Join(" ", pairs.Select(p => $"{p.Key}={p.Value}"))
                : string.Empty;
            var scoped = new List<string>();
            scopes.ForEachScope(
                (scope, list) =>
                {
                    if (scope is IEnumerable<KeyValuePair<string, object>> values)
                    {
                        list.AddRange(values.Select(v => $"{v.Key}={v.Value}"));
                    }
                },
                scoped);
            lines.Enqueue($"{logLevel} {category}: {formatter(state, exception)} {structured} [{string.Join(" ", scoped)}] {exception}");
        }
    }
}
