namespace TripTestLog.Ingest.Tests;

/// <summary>Small record files in the documented formats (README, "Record formats, version 1").</summary>
internal static class Records
{
    public static readonly DateOnly Today = new(2026, 12, 1);

    public const string Register = """
        asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v,commissioned_on,contact_limit_uohm,make,model,serial
        T-01,Test Site,"Board 1, way 1",iec60898,C,16,1,230,2019-04-02,8000,Acme,M1,S1
        T-02,Test Site,Board 1 way 2,iec60898,B,40,3,400,,,,,
        """;

    public const string Trips = """
        asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,ambient_c,instrument,technician,note
        T-01,2024-03-18T09:00,as-found,all,18.2,,3600,cold,21,INJ-1,A. Tester,
        T-01,2024-03-18T10:01,as-found,all,23.3,1500,,warm,21,INJ-1,A. Tester,
        T-01,2024-03-18T12:00,as-found,all,40.9,22.5,,cold,21,INJ-1,A. Tester,
        """;
}
