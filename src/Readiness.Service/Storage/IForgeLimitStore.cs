namespace Readiness.Service.Storage;

/// <summary>
/// The forge's rate-limit answers, kept in the database so every instance honours what one of them was told:
/// until when calls under a token (a scope) must wait.
/// </summary>
public interface IForgeLimitStore
{
    /// <summary>Until when calls in <paramref name="scope"/> must wait, if a limit is recorded.</summary>
    Task<DateTimeOffset?> BlockedUntilAsync(string scope, CancellationToken cancellationToken);

    /// <summary>Records a limit; a later limit already recorded stays.</summary>
    Task BlockAsync(string scope, DateTimeOffset until, CancellationToken cancellationToken);
}
