namespace FilterQA.Web.Accounts;

/// <summary>Authorization policy and scheme names of the host.</summary>
public static class Policies
{
    /// <summary>A signed-in person (not a station key). Also the fallback policy of every page and endpoint.</summary>
    public const string Person = "person";

    /// <summary>A signed-in administrator.</summary>
    public const string Administrator = "administrator";

    /// <summary>A station's API key.</summary>
    public const string StationKey = "station-key";

    /// <summary>A signed-in person or a station key (read-only API).</summary>
    public const string PersonOrStation = "person-or-station";

    /// <summary>The default scheme: a station key when an X-Api-Key header is sent, else the sign-in cookie.</summary>
    public const string DefaultScheme = "FilterQA";

    /// <summary>The station key scheme.</summary>
    public const string StationKeyScheme = "StationKey";

    /// <summary>The header carrying a station key.</summary>
    public const string ApiKeyHeader = "X-Api-Key";
}
