namespace FilterQA.Web.Watching;

/// <summary>A station's watched folder (config Stations:&lt;station&gt;:WatchFolder) and, optionally, the account its files are recorded under.</summary>
public sealed record WatchedFolder(string Station, string Folder, string? OperatorUserName);
