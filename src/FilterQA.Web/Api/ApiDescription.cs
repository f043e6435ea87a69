namespace FilterQA.Web.Api;

/// <summary>The API's description in the OpenAPI document: how to authenticate and what a sweep body may be.</summary>
internal static class ApiDescription
{
    public const string Text = """
        Posts sweeps of sample units and reads lot summaries.

        Authentication: a station key in the X-Api-Key header (made by an administrator with
        POST /api/v1/stations/{station}/api-keys and shown once). The sweep is recorded at the key's station.

        A sweep body is one of:
        - the file itself, Content-Type text/plain, text/csv or application/octet-stream, with its name in the
          fileName query parameter (the extension picks the format: .s1p … .sNp, .ts for Touchstone; .csv, .tsv,
          .txt, .dat for delimited text);
        - JSON (application/json) {"fileName": "unit.s2p", "touchstone": "<the Touchstone text>"};
        - JSON (application/json) {"fileName": "unit.json", "frequencyHz": [...], "gainDb": [...], "phaseDeg": [...]}
          with gain in dB (negative for a loss, as an analyser shows S21), phase optional, frequencies strictly
          increasing; it is stored as delimited text (frequency_hz, gain_db, phase_deg) named like fileName with .csv.

        Idempotency-Key header (1 to 200 characters): a retry with the same key and the same request stores the unit
        once and gets the same status and body; the same key with another request is answered 422.

        Errors are ProblemDetails: 401 no or unknown key, 403 wrong kind of caller, 404 unknown lot, 409 refused (no or
        expired thru, lot closed, sample complete), 413 body too large, 415 wrong content type, 422 unreadable sweep
        (with fileName, line and column).
        """;
}
