using System.Data.Common;
using System.Text.RegularExpressions;
using Microsoft.EntityFrameworkCore.Diagnostics;

namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>Injects a failure: throws before the first command whose SQL matches the pattern is sent; records the commands sent before.</summary>
public sealed class FailOnCommandInterceptor(Regex pattern) : DbCommandInterceptor
{
    private readonly List<string> _sent = [];

    public IReadOnlyList<string> SentBeforeFailure => _sent;

    public bool Fired { get; private set; }

    public override ValueTask<InterceptionResult<DbDataReader>> ReaderExecutingAsync(DbCommand command, CommandEventData eventData,
        InterceptionResult<DbDataReader> result, CancellationToken cancellationToken = default)
    {
        Inspect(command);
        return base.ReaderExecutingAsync(command, eventData, result, cancellationToken);
    }

    public override ValueTask<InterceptionResult<int>> NonQueryExecutingAsync(DbCommand command, CommandEventData eventData,
        InterceptionResult<int> result, CancellationToken cancellationToken = default)
    {
        Inspect(command);
        return base.NonQueryExecutingAsync(command, eventData, result, cancellationToken);
    }

    public override ValueTask<InterceptionResult<object>> ScalarExecutingAsync(DbCommand command, CommandEventData eventData,
        InterceptionResult<object> result, CancellationToken cancellationToken = default)
    {
        Inspect(command);
        return base.ScalarExecutingAsync(command, eventData, result, cancellationToken);
    }

    private void Inspect(DbCommand command)
    {
        if (!Fired && pattern.IsMatch(command.CommandText))
        {
            Fired = true;
            throw new InjectedFailureException($"injected failure before a command matching {pattern}");
        }
        if (!Fired)
        {
            _sent.Add(command.CommandText);
        }
    }
}
