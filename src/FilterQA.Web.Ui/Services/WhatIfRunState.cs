namespace FilterQA.Web.Ui.Services;

/// <summary>Where a what-if run stands.</summary>
public enum WhatIfRunState
{
    /// <summary>No run started yet.</summary>
    Idle,

    /// <summary>Running in the background.</summary>
    Running,

    /// <summary>Finished; the report is complete.</summary>
    Finished,

    /// <summary>Cancelled; nothing of it is shown.</summary>
    Cancelled,

    /// <summary>Stopped by an error; the message says why.</summary>
    Failed,
}
