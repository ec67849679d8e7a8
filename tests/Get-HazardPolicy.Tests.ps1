param([string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'))

BeforeAll {
    Import-Module $ModulePath -Force
    $root = Split-Path $PSScriptRoot -Parent
    $policyFile = Join-Path $root 'examples/marrowby-heath-policy.psd1'
    # Loose, so that the Shock limit the policy sets is what governs (a worn bangle's wearer would be in a field above
    # the exposure limit).
    $bangle = New-ConductiveItem -Name 'Open bangle' -Material Copper -Diameter '65 mm' -WireDiameter '4 mm' -Gap '10 mm' -Contact Loose

    # A sine whose gap voltage is 30 V rms: between the site's 25 V and the published 50 V (the emf is linear in the field).
    $probe = New-FieldWaveform -Sine -Amplitude '10 mT' -Frequency '1 kHz' | New-FieldSource -Uniform -Name 'probe'
    $rms = (($bangle | Test-InductionHazard -Source $probe).Mechanisms | Where-Object Mechanism -EQ 'Shock').Predicted
    $coil = New-FieldWaveform -Sine -Amplitude (0.010 * 30 / $rms) -Frequency '1 kHz' | New-FieldSource -Uniform -Name 'Coil'
}

Describe 'Get-HazardPolicy' {
    It 'gives the published defaults, each limit with its published source' {
        $policy = Get-HazardPolicy
        $policy.SafetyFactor | Should -Be 2
        foreach ($limit in $policy.Limits) {
            $limit.Source | Should -Not -BeNullOrEmpty
            $limit.Source | Should -Not -Match 'site policy'
        }
        ($policy.Limits | Where-Object Key -EQ 'AlternatingVoltageLimit').Source | Should -Match 'IEC 61140'
    }

    It 'merges a site policy file over the defaults, naming "site policy" only for what it sets' {
        $policy = Get-HazardPolicy $policyFile
        $policy.Name | Should -Be 'Marrowby Heath site rules 2026'
        $policy.AlternatingVoltageLimitRms | Should -Be 25
        ($policy.Limits | Where-Object Key -EQ 'AlternatingVoltageLimit').Source | Should -Match "^site policy 'Marrowby Heath site rules 2026'"
        ($policy.Limits | Where-Object Key -EQ 'ThermalDoseLimit').Source | Should -Match 'van Rhoon'
        $policy.Fingerprint | Should -Not -Be (Get-HazardPolicy).Fingerprint
    }

    It 'refuses a policy file that holds code, an unknown key or a value of the wrong kind, naming it' {
        $code = Join-Path $TestDrive 'code.psd1'
        Set-Content $code "@{ SafetyFactor = (Get-Date).Second }"
        { Get-HazardPolicy $code } | Should -Throw -ErrorId 'InvalidPolicyFile,*'
        { Get-HazardPolicy $code } | Should -Throw '*holds code*'
        $unknown = Join-Path $TestDrive 'unknown.psd1'
        Set-Content $unknown "@{ SafetyFactor = 3; VoltageLimit = '10 V' }"
        { Get-HazardPolicy $unknown } | Should -Throw '*VoltageLimit: is not a policy key*'
        $unit = Join-Path $TestDrive 'unit.psd1'
        Set-Content $unit "@{ DirectVoltageLimit = '2 s' }"
        { Get-HazardPolicy $unit } | Should -Throw '*DirectVoltageLimit: expected a voltage*'
        $low = Join-Path $TestDrive 'low.psd1'
        Set-Content $low "@{ SafetyFactor = 0.5 }"
        { Get-HazardPolicy $low } | Should -Throw '*SafetyFactor*at least 1*'
    }
}

Describe 'A site policy in a verdict' {
    It 'flips a verdict when it lowers a limit, and names "site policy" as that limit''s source' {
        $published = $bangle | Test-InductionHazard -Source $coil
        $published.Verdict | Should -Be 'Caution'
        $published.GoverningMechanism | Should -Be 'Shock'
        $site = $bangle | Test-InductionHazard -Source $coil -Policy $policyFile
        $site.Verdict | Should -Be 'Hazard'
        $site.GoverningMechanism | Should -Be 'Shock'
        ($site.Mechanisms | Where-Object Mechanism -EQ 'Shock').Basis | Should -Match "^site policy 'Marrowby Heath site rules 2026': AlternatingVoltageLimit = 25 V"
        $site.PolicyName | Should -Be 'Marrowby Heath site rules 2026'
        ($site.Cautions -join ' ') | Should -Match 'site policy'
        ($published.Cautions -join ' ') | Should -Not -Match 'site policy' -Because '"site policy" appears only where one was applied'
    }

    It 'takes the policy as an object, a path or a table alike' {
        $byObject = $bangle | Test-InductionHazard -Source $coil -Policy (Get-HazardPolicy $policyFile)
        $byTable = $bangle | Test-InductionHazard -Source $coil -Policy @{ Name = 'Marrowby Heath site rules 2026'; SafetyFactor = 3; AlternatingVoltageLimit = '25 V'; DirectVoltageLimit = '60 V'; TouchTime = '2 s' }
        $byObject.PolicyHash | Should -Be $byTable.PolicyHash
        $byObject.ShockMargin | Should -Be $byTable.ShockMargin
        { $bangle | Test-InductionHazard -Source $coil -Policy @{ SafetyFactr = 3 } } | Should -Throw '*SafetyFactr: is not a policy key*'
    }

    It 'applies the policy a site file carries, unless -Policy is given' {
        $siteFile = Join-Path $TestDrive 'site.psd1'
        $policyCopy = Join-Path $TestDrive 'rules.psd1'
        Copy-Item $policyFile $policyCopy
        Set-Content $siteFile @"
@{
    Site = 'Test bay'
    Policy = 'rules.psd1'
    Stations = @(
        @{ Name = 'Coil'; Sources = @( @{ Form = 'Uniform'; Axis = 'z'; Waveform = @{ Form = 'Sine'; Amplitude = $(0.010 * 30 / $rms); Frequency = '1 kHz' } } ) }
    )
}
"@
        $site = Import-HazardSite $siteFile
        $site.Policy.Name | Should -Be 'Marrowby Heath site rules 2026'
        ($bangle | Test-InductionHazard -Site $site -Station Coil).Verdict | Should -Be 'Hazard'
        ($bangle | Test-InductionHazard -Site $site -Station Coil -Policy (Get-HazardPolicy)).Verdict | Should -Be 'Caution'

        Set-Content $siteFile "@{ Site = 'Test bay'; Policy = @{ Colour = 'red' }; Stations = @( @{ Name = 'Coil'; Sources = @( @{ Form = 'Uniform'; Waveform = @{ Form = 'Sine'; Amplitude = '1 mT'; Frequency = '50 Hz' } } ) } ) }"
        { Import-HazardSite $siteFile } | Should -Throw '*Colour: is not a policy key*'
    }

    It 'lets a site with a controlled magnet hall raise the static exposure limit, and names it where it judges' {
        # ICNIRP 2009: 2 T for the head and trunk, up to 8 T for specific work in a controlled environment.
        $held = New-ConductiveItem -Name 'Spanner loop' -Material Titanium -Diameter '50 mm' -WireDiameter '4 mm' -Gap '10 mm' -Contact Held
        $magnet = New-FieldWaveform -Ramp -From '0 T' -To '7 T' -Duration '10 min' | New-FieldSource -Uniform -Name 'Magnet'
        $published = Test-InductionHazard -Item $held -Source $magnet
        $published.Verdict | Should -Be 'Hazard'
        $published.GoverningMechanism | Should -Be 'Exposure'
        $hall = Test-InductionHazard -Item $held -Source $magnet -Policy @{ Name = 'Magnet hall'; StaticExposureLimit = '8 T' }
        $hall.ExposureMargin | Should -BeGreaterThan 1.14
        $hall.ExposureMargin | Should -BeLessThan 1.15
        ($hall.Mechanisms | Where-Object Mechanism -EQ 'Exposure').Basis | Should -Match "site policy 'Magnet hall': StaticExposureLimit = 8 T"
        (Test-FieldExposure -Source $magnet -Position '0, 0, 0' -Policy @{ StaticExposureLimit = '8 T' }).Margin | Should -BeGreaterThan 1.14
        { Get-HazardPolicy -Path (New-Item (Join-Path $TestDrive 'nine.psd1') -Value "@{ StaticExposureLimit = '9 T' }") } | Should -Throw '*StaticExposureLimit*'
    }

    # Validates: a visitor's worn ring at 50 Hz judged through Test-InductionHazard under a Public policy, margin 0.2 mT over 0.354 mT rms, and its safe distance beside a 2 kA line through Find-SafeDistance | ICNIRP 2010 table 4 (0.2 mT rms at 25-400 Hz, general public); B = mu0 I / (2 pi r) (Ampere's law) | 0.2 %, 0.1 %
    It 'judges the public''s exposure where a policy names ExposureGroup = Public, for a visitor''s ring, a place, a safe distance and the policy shown' {
        # ICNIRP 2010 at 50 Hz: 1 mT rms for workers (table 3), 0.2 mT for the public (table 4). 0.5 mT peak is 0.354 mT rms.
        $ring = New-ConductiveItem -Name 'Visitor ring' -Material Gold -Diameter '19 mm' -WireDiameter '2 mm' -Contact Worn
        $mains = New-FieldWaveform -Sine -Amplitude '0.5 mT' -Frequency '50 Hz' | New-FieldSource -Uniform -Name 'Gallery busbar'
        $visitors = @{ Name = 'Visitor gallery'; ExposureGroup = 'Public' }
        $worker = Test-InductionHazard -Item $ring -Source $mains
        $visitor = Test-InductionHazard -Item $ring -Source $mains -Policy $visitors
        $worker.Verdict | Should -Be 'Clear'
        $visitor.Verdict | Should -Be 'Hazard'
        $visitor.GoverningMechanism | Should -Be 'Exposure'
        $visitor.ExposureMargin | Should -BeGreaterThan 0.565
        $visitor.ExposureMargin | Should -BeLessThan 0.566
        $exposure = $visitor.Mechanisms | Where-Object Mechanism -EQ 'Exposure'
        $exposure.Sources | Should -Contain "site policy 'Visitor gallery': ExposureGroup = Public"
        $exposure.Detail | Should -Match "against the general public's limit"
        $visitor.PolicyHash | Should -Not -Be $worker.PolicyHash

        $place = Test-FieldExposure -Source $mains -Policy $visitors
        $place.Margin | Should -Be (Test-FieldExposure -Source $mains -Public).Margin
        $place.Finding | Should -Match 'general public limit'

        # A line carrying 2 kA at 50 Hz: the workers' ring is Clear from 0.57 m (0.5 mT rms), the visitor's from 2.83 m (0.1 mT rms).
        $line = New-FieldWaveform -Sine -Amplitude '2 kA' -Frequency '50 Hz' | New-FieldSource -Conductor -Axis z -Name 'Feeder'
        $workersDistance = Find-SafeDistance -Item $ring -Source $line -From '50 mm, 0, 0' -Direction 'x'
        $visitorsDistance = Find-SafeDistance -Item $ring -Source $line -From '50 mm, 0, 0' -Direction 'x' -Policy $visitors
        $visitorsDistance.DistanceMeters + 0.05 | Should -BeGreaterThan (0.999 * 2e-7 * 2000 / ([math]::Sqrt(2) * 1e-4))
        $visitorsDistance.DistanceMeters + 0.05 | Should -BeLessThan (1.001 * 2e-7 * 2000 / ([math]::Sqrt(2) * 1e-4))
        ($visitorsDistance.DistanceMeters + 0.05) / ($workersDistance.DistanceMeters + 0.05) | Should -BeGreaterThan 4.99

        $file = Join-Path $TestDrive 'gallery.psd1'
        Set-Content $file "@{ Name = 'Visitor gallery'; ExposureGroup = 'Public' }"
        $shown = Get-HazardPolicy $file | Format-List | Out-String
        $shown | Should -Match "ExposureGroup\s*: Public \(site policy 'Visitor gallery': ExposureGroup = Public\)"
        (Get-HazardPolicy | Format-List | Out-String) | Should -Match 'ExposureGroup\s*: Occupational \(occupational exposure'
        Set-Content $file "@{ ExposureGroup = 'Visitors' }"
        { Get-HazardPolicy $file } | Should -Throw "*ExposureGroup: 'Visitors' is not one of Occupational, Public*"
    }

    It 'applies a station''s own policy over the site''s at that station alone, from a table or a file, unless -Policy is given' {
        $folder = Join-Path $TestDrive 'gallery-site'
        New-Item -ItemType Directory $folder | Out-Null
        Copy-Item $policyFile (Join-Path $folder 'rules.psd1')
        Set-Content (Join-Path $folder 'gallery.psd1') "@{ Name = 'Gallery rules'; ExposureGroup = 'Public' }"
        $siteFile = Join-Path $folder 'site.psd1'
        $mains = "Sources = @( @{ Form = 'Uniform'; Waveform = @{ Form = 'Sine'; Amplitude = '0.5 mT'; Frequency = '50 Hz' } } )"
        Set-Content $siteFile @"
@{
    Site = 'Test bay'
    Policy = 'rules.psd1'
    Stations = @(
        @{ Name = 'Hall'; $mains }
        @{ Name = 'Gallery'; $mains; Policy = 'gallery.psd1' }
        @{ Name = 'Tour stop'; $mains; Policy = @{ ExposureGroup = 'Public' } }
    )
}
"@
        $site = Import-HazardSite $siteFile
        $site.PolicyAt('Gallery').Name | Should -Be 'Gallery rules'
        $site.PolicyAt('Tour stop').Name | Should -Be 'Marrowby Heath site rules 2026 at Tour stop'
        $site.PolicyAt('Tour stop').AlternatingVoltageLimitRms | Should -Be 25 -Because 'a station''s policy keeps the site''s values it does not set'
        $rows = @('Hall', 'Gallery', 'Tour stop') | ForEach-Object { [pscustomobject]@{ Name = "Ring at $_"; Material = 'Gold'; Diameter = '19 mm'; WireDiameter = '2 mm'; Station = $_ } }

        $serial = $rows | Test-InductionHazard -Site $site
        ($serial | ForEach-Object Verdict) -join ',' | Should -Be 'Caution,Hazard,Hazard' -Because 'the site''s safety factor is 3; the public''s limit is a fifth of the workers'''
        ($serial | ForEach-Object PolicyName) -join ',' | Should -Be 'Marrowby Heath site rules 2026,Gallery rules,Marrowby Heath site rules 2026 at Tour stop'
        ($serial[2].Mechanisms | Where-Object Mechanism -EQ 'Exposure').Sources | Should -Contain "site policy 'Marrowby Heath site rules 2026 at Tour stop': ExposureGroup = Public"
        $threads = $rows | Test-InductionHazard -Site $site -ThrottleLimit 2
        ($threads | ForEach-Object PolicyHash) -join ',' | Should -Be (($serial | ForEach-Object PolicyHash) -join ',')
        $replaced = $rows | Test-InductionHazard -Site $site -Policy (Get-HazardPolicy) -WarningVariable warned -WarningAction SilentlyContinue
        ($replaced | ForEach-Object Verdict) -join ',' | Should -Be 'Clear,Clear,Clear'
        $warned.Count | Should -Be 2 -Because 'two stations have policies of their own, which -Policy replaces'
        "$($warned[0])" | Should -BeLike "-Policy replaces the own policy of station 'Gallery' ('Gallery rules', which judges the public's exposure): it is judged by 'default (published limits)' alone."
        $null = $rows[0] | Test-InductionHazard -Site $site -Station Hall -Policy (Get-HazardPolicy) -WarningVariable none -WarningAction SilentlyContinue
        $none.Count | Should -Be 0 -Because 'the station named by -Station has no policy of its own'

        Remove-Item (Join-Path $folder 'gallery.psd1')
        { Import-HazardSite $siteFile } | Should -Throw "*station 'Gallery', its Policy file*"
    }
}
