namespace FilterQA.Web.Api.Intake;

/// <summary>A sweep as received: the bytes to store and read, and the file name that picks the reader.</summary>
public sealed record SweepBody(byte[] Bytes, string FileName);
