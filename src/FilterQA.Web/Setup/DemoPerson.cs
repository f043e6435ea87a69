namespace FilterQA.Web.Setup;

/// <summary>An invented inspector of the demo scenario.</summary>
internal sealed record DemoPerson(string UserName, string DisplayName, string Role, string Badge);
