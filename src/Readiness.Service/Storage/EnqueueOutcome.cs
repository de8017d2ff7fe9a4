namespace Readiness.Service.Storage;

/// <summary>What recording a delivery did.</summary>
public enum EnqueueOutcome
{
    /// <summary>The delivery id was seen before; nothing changed.</summary>
    Duplicate,

    /// <summary>Recorded; the event asks for no work.</summary>
    Ignored,

    /// <summary>A new job was queued.</summary>
    Queued,

    /// <summary>A job already queued for the same pull request now points at the newer head commit.</summary>
    Collapsed,

    /// <summary>The repository already holds as many queued jobs as allowed; nothing was recorded.</summary>
    QueueFull,
}
