# The site policy of the Marrowby Heath Field Laboratory (an invented site): stricter than the published limits
# where the laboratory's own rules are. Read as data by Get-HazardPolicy and -Policy: no code runs.
@{
    Name                    = 'Marrowby Heath site rules 2026'
    SafetyFactor            = 3
    AlternatingVoltageLimit = '25 V'
    DirectVoltageLimit      = '60 V'
    TouchTime               = '2 s'
}
