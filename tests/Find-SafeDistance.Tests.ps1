param([string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'))

BeforeAll {
    Import-Module $ModulePath -Force
    $fault = New-FieldWaveform -Fault -Current '40 kA' -XOverR 14 -Frequency '50 Hz' -ClearingTime '200 ms' |
        New-FieldSource -Busbar -Width '120 mm' -Thickness '10 mm' -Name 'Busbar B1'
    # Loose: a worn ring would put its wearer in the busbar's field, whose own exposure limit then governs.
    $ring = New-ConductiveItem -Name 'Copper ring' -Material Copper -Diameter '60 mm' -WireDiameter '3 mm' -Contact Loose
}

Describe 'Find-SafeDistance' {
    It 'returns a distance at which the item is Clear, and 2 % nearer it is not' {
        $found = Find-SafeDistance -Item $ring -Source $fault -From '70 mm, 0, 0' -Direction x -MaxDistance '3 m'
        $found.Found | Should -BeTrue
        $found.Verdict | Should -Be 'Clear'
        $found.GoverningMechanism | Should -Not -BeNullOrEmpty
        $d = $found.DistanceMeters
        (Test-InductionHazard -Item $ring -Source $fault -Position "$(0.07 + $d), 0, 0").Verdict | Should -Be 'Clear'
        (Test-InductionHazard -Item $ring -Source $fault -Position "$(0.07 + 0.98 * $d), 0, 0").Verdict | Should -Not -Be 'Clear'
        $found.Position.X | Should -BeGreaterThan 0.07
        ($found.Cautions -join ' ') | Should -Match 'engineering estimates'
    }

    It 'says so, with no distance, when the item is not Clear anywhere within -MaxDistance' {
        $found = Find-SafeDistance -Item $ring -Source $fault -From '70 mm, 0, 0' -Direction x -MaxDistance '20 mm' -WarningVariable warned 3>$null
        $found.Found | Should -BeFalse
        [double]::IsNaN($found.DistanceMeters) | Should -BeTrue
        $warned | Should -Match 'not Clear anywhere within'
    }

    It 'takes inventory rows from the pipeline and refuses a zero direction, naming it' {
        $rows = @([pscustomobject]@{ Name = 'Row ring'; Material = 'Copper'; Diameter = '60 mm'; WireDiameter = '3 mm'; Contact = 'Worn' })
        ($rows | Find-SafeDistance -Source $fault -From '70 mm, 0, 0' -Direction x -MaxDistance '3 m' -WarningAction SilentlyContinue).ItemName | Should -Be 'Row ring'
        { Find-SafeDistance -Item $ring -Source $fault -Direction '0, 0, 0' } | Should -Throw -ErrorId 'InvalidInput,*'
        { Find-SafeDistance -Item $ring -Source $fault -Direction x -MaxDistance '0.1 mm' } | Should -Throw '*MaxDistance*'
    }

    It 'takes several items given at once to -Item in turn, as piped; a $null is its row''s error and the rest go on' {
        $row = [pscustomobject]@{ Name = 'Row ring'; Material = 'Copper'; Diameter = '60 mm'; WireDiameter = '3 mm'; Contact = 'Loose' }
        $alone = Find-SafeDistance -Item $ring -Source $fault -From '70 mm, 0, 0' -Direction x -MaxDistance '3 m' -WarningAction SilentlyContinue
        foreach ($run in @(
                @{ Name = 'given at once'; Out = { Find-SafeDistance -Item $null, $ring, $row -Source $fault -From '70 mm, 0, 0' -Direction x -MaxDistance '3 m' -WarningAction SilentlyContinue -ErrorVariable script:bad -ErrorAction SilentlyContinue } },
                @{ Name = 'piped'; Out = { $null, $ring, $row | Find-SafeDistance -Source $fault -From '70 mm, 0, 0' -Direction x -MaxDistance '3 m' -WarningAction SilentlyContinue -ErrorVariable script:bad -ErrorAction SilentlyContinue } })) {
            $script:bad = $null
            $out = @(& $run.Out)
            $out.ItemName | Should -Be @('Copper ring', 'Row ring') -Because $run.Name
            $out.DistanceMeters | Should -Be @($alone.DistanceMeters, $alone.DistanceMeters) -Because "$($run.Name): the row is the same ring"
            @($script:bad).Count | Should -Be 1 -Because $run.Name
            "$($script:bad[0])" | Should -Match '^row 1: Item: is \$null' -Because $run.Name
        }
    }

    It 'gives a row that repeats an earlier row''s item what searching for it alone gives, under its own name, and its own warning and error' {
        $fields = @{ Material = 'Copper'; Diameter = '60 mm'; WireDiameter = '3 mm'; Contact = 'Loose' }
        $rows = @(
            [pscustomobject](@{ Name = 'Ring A'; AssetTag = 'R-1' } + $fields)
            [pscustomobject]@{ Name = 'Bad'; Material = 'Unobtainium'; Diameter = '60 mm'; WireDiameter = '3 mm' }
            [pscustomobject](@{ Name = 'Ring B'; AssetTag = 'R-2' } + $fields)
            [pscustomobject](@{ Name = ''; AssetTag = 'R-3' } + $fields)
            [pscustomobject]@{ Name = 'Bad again'; Material = 'Unobtainium'; Diameter = '60 mm'; WireDiameter = '3 mm' }
        )
        # The result less when its assessment was made.
        function ConvertTo-ResultText([object] $Result) { ($Result | ConvertTo-Json -Depth 8 -Compress) -replace '"AssessedUtc":"[^"]*"' }
        $together = @($rows | Find-SafeDistance -Source $fault -From '70 mm, 0, 0' -Direction x -MaxDistance '3 m' -ErrorAction SilentlyContinue -ErrorVariable failed)
        $together.ItemName | Should -Be @('Ring A', 'Ring B', 'row 4')
        $failed.Exception.Message | ForEach-Object { $_ -replace ':.*' } | Should -Be @("row 2 ('Bad')", "row 5 ('Bad again')")
        $found = 0
        foreach ($k in 0, 2, 3) {
            $row = $rows[$k].PSObject.Copy()
            if (-not $row.Name) { $row.Name = "row $($k + 1)" }
            $alone = $row | Find-SafeDistance -Source $fault -From '70 mm, 0, 0' -Direction x -MaxDistance '3 m'
            ConvertTo-ResultText $together[$found] | Should -Be (ConvertTo-ResultText $alone) -Because "row $($k + 1) against the same row searched alone"
            $found++
        }

        $short = @($rows[0], $rows[2] | Find-SafeDistance -Source $fault -From '70 mm, 0, 0' -Direction x -MaxDistance '20 mm' -WarningVariable warned 3>$null)
        $short.Found | Should -Be @($false, $false)
        @($warned | Where-Object { "$_" -match '^row 1 .*not Clear anywhere' }).Count | Should -Be 1
        @($warned | Where-Object { "$_" -match '^row 2 .*Ring B.*not Clear anywhere' }).Count | Should -Be 1
    }

    # Validates: Find-SafeDistance from a site's visitors' station, by its own policy, beside a 2 kA 50 Hz line: Clear where the rms field is half the public's reference level | ICNIRP 2010 table 4 (0.2 mT rms at 25-400 Hz, general public); B = mu0 I / (2 pi r) (Ampere's law) | 0.1 %
    It 'searches from a site''s station in its field, by its own policy, unless -From or -Policy is given' {
        # A 2 kA (amplitude) 50 Hz line; a visitors' walkway 1 m from it whose own policy judges the public. A visitor's
        # worn ring is Clear where the rms field is 0.1 mT (half the public's 0.2 mT at 50 Hz, ICNIRP 2010 table 4):
        # r = mu0 I / (2 pi sqrt 2 0.1 mT) = 2.83 m (Ampere's law); a worker's where it is 0.5 mT, 0.57 m, inside the walkway.
        $siteFile = Join-Path $TestDrive 'walkway-site.psd1'
        Set-Content $siteFile @"
@{
    Site = 'Line bay'
    Stations = @(
        @{ Name = 'Walkway'; Sources = @( @{ Form = 'Conductor'; Axis = 'z'; Waveform = @{ Form = 'Sine'; Amplitude = '2 kA'; Frequency = '50 Hz' } } ); Position = '1 m, 0, 0'; Policy = @{ Name = 'Tour rules'; ExposureGroup = 'Public' } }
    )
}
"@
        $site = Import-HazardSite $siteFile
        $ring = New-ConductiveItem -Name 'Visitor ring' -Material Copper -Diameter '20 mm' -WireDiameter '2 mm'
        $expected = 4e-7 * 2000 / (2 * [math]::Sqrt(2) * 1e-4)
        $visitor = Find-SafeDistance -Item $ring -Site $site -Station walkway -Direction x
        $visitor.From.X | Should -Be 1 -Because 'the search starts at the station''s position'
        [math]::Abs($visitor.Position.X / $expected - 1) | Should -BeLessThan 0.001
        $visitor.Assessment.PolicyName | Should -Be 'Tour rules'
        $visitor.GoverningMechanism | Should -Be 'Exposure'
        (Find-SafeDistance -Item $ring -Site $site -Station walkway -Direction x -Policy (Get-HazardPolicy) -WarningVariable replaced -WarningAction SilentlyContinue).DistanceMeters | Should -Be 0 -Because 'a worker is Clear at the walkway itself'
        "$replaced" | Should -BeLike "-Policy replaces the own policy of station 'Walkway' ('Tour rules', which judges the public's exposure)*"
        $from = Find-SafeDistance -Item $ring -Site $site -Station walkway -Direction x -From '2 m, 0, 0'
        [math]::Abs($from.Position.X / $expected - 1) | Should -BeLessThan 0.001
        $from.From.X | Should -Be 2
        { Find-SafeDistance -Item $ring -Site $site -Station Office -Direction x } | Should -Throw "*'Office' is not a station of Line bay*"
    }

    It 'judges an item moved at -Velocity, or at its station''s velocity, at every point: a closed loop braked by its eddy current is Clear further out' {
        $magnet = New-FieldWaveform -Ramp -From 0 -To '500 A' -Duration '10 min' | New-FieldSource -Solenoid -Radius '300 mm' -Length '1.2 m' -Turns 4000 -Name 'Magnet M2'
        $loop = New-ConductiveItem -Name 'Loose loop' -Material Copper -Diameter '200 mm' -WireDiameter '4 mm' -Contact Free
        $still = Find-SafeDistance -Item $loop -Source $magnet -From '0, 0, 700 mm' -Direction z -Normal z -MaxDistance '10 m'
        $moving = Find-SafeDistance -Item $loop -Source $magnet -From '0, 0, 700 mm' -Direction z -Normal z -MaxDistance '10 m' -Velocity '0, 0, -1.5 m/s'
        $moving.Found | Should -BeTrue
        $moving.DistanceMeters | Should -BeGreaterThan ($still.DistanceMeters * 1.2) -Because 'carried toward the bore, the loop is braked by its eddy current as well as pulled'
        $moving.Assessment.Response.BrakingForceNewtons | Should -BeGreaterThan 0
        $still.Assessment.Response.BrakingForceNewtons | Should -BeNullOrEmpty
        # The verdict at the distance found is the one Test-InductionHazard gives an item moved there at that speed.
        $there = Test-InductionHazard -Item $loop -Source $magnet -Position $moving.Position -Normal z -Velocity '0, 0, -1.5 m/s'
        $there.Verdict | Should -Be 'Clear'
        $there.MinimumMargin | Should -Be $moving.MinimumMargin

        $siteFile = Join-Path $TestDrive 'magnet-site.psd1'
        Set-Content $siteFile @"
@{
    Site = 'Magnet hall'
    Stations = @(
        @{ Name = 'Bore approach'; Sources = @( @{ Form = 'Solenoid'; Radius = '300 mm'; Length = '1.2 m'; Turns = 4000; Waveform = @{ Form = 'Ramp'; From = '0 A'; To = '500 A'; Duration = '10 min' } } ); Position = '0, 0, 700 mm'; Normal = 'z'; Velocity = '0, 0, -1.5 m/s' }
    )
}
"@
        $site = Import-HazardSite $siteFile
        $atStation = Find-SafeDistance -Item $loop -Site $site -Station 'Bore approach' -Direction z -MaxDistance '10 m'
        $atStation.DistanceMeters | Should -Be $moving.DistanceMeters -Because 'the station''s velocity is taken where -Velocity is not given'
        (Find-SafeDistance -Item $loop -Site $site -Station 'Bore approach' -Direction z -MaxDistance '10 m' -Velocity '0, 0, 0').DistanceMeters | Should -Be $still.DistanceMeters
        { Find-SafeDistance -Item $loop -Source $magnet -Direction z -Velocity '0, 0, 300 m/s' -ErrorAction Stop } | Should -Throw '*Velocity*'
    }

    It 'takes a row''s own velocity and normal along the whole ray as -Velocity and -Normal would, and says once that a row''s position is not read' {
        $magnet = New-FieldWaveform -Ramp -From 0 -To '500 A' -Duration '10 min' | New-FieldSource -Solenoid -Radius '300 mm' -Length '1.2 m' -Turns 4000 -Name 'Magnet M2'
        $loop = New-ConductiveItem -Name 'Loose loop' -Material Copper -Diameter '200 mm' -WireDiameter '4 mm' -Contact Free
        $moving = Find-SafeDistance -Item $loop -Source $magnet -From '0, 0, 700 mm' -Direction z -Normal z -MaxDistance '10 m' -Velocity '0, 0, -1.5 m/s'
        $still = Find-SafeDistance -Item $loop -Source $magnet -From '0, 0, 700 mm' -Direction z -Normal z -MaxDistance '10 m'
        $rows = @(
            [pscustomobject]@{ Name = 'Carried loop'; Material = 'Copper'; Diameter = '200 mm'; WireDiameter = '4 mm'; Contact = 'Free'; Normal = 'z'; Velocity = '0, 0, -1.5 m/s'; X = '5 m'; Y = '0'; Z = '0' }
            [pscustomobject]@{ Name = 'Parked loop'; Material = 'Copper'; Diameter = '200 mm'; WireDiameter = '4 mm'; Contact = 'Free'; Normal = 'z'; Velocity = '0, 0, 0'; X = '6 m'; Y = '0'; Z = '0' }
        )
        $out = @($rows | Find-SafeDistance -Source $magnet -From '0, 0, 700 mm' -Direction z -Normal x -MaxDistance '10 m' -WarningVariable warned -WarningAction SilentlyContinue)
        $out[0].DistanceMeters | Should -Be $moving.DistanceMeters -Because 'the row''s velocity and normal hold at every point, over -Normal x'
        $out[1].DistanceMeters | Should -Be $still.DistanceMeters -Because 'a row''s zero velocity places the item'
        @($warned).Count | Should -Be 1
        "$($warned[0])" | Should -BeLike "row 1 ('Carried loop') gives a position (X, Y, Z or Position), which the search does not read: every row is searched along the ray from -From*"
    }

    It 'takes -Tilt, or a row''s own Tilt, at every point of the ray: a loop turned from the worst orientation is Clear nearer in' {
        # A split cable loop beside a line at 10 kHz: its gap voltage falls as the cosine of the tilt, and with it the distance.
        $line = New-FieldWaveform -Sine -Amplitude '50 kA' -Frequency '10 kHz' | New-FieldSource -Conductor -Name 'Feeder'
        $loop = New-ConductiveItem -Name 'Cable loop' -Material Copper -Diameter '300 mm' -WireDiameter '4 mm' -Gap '5 mm' -Contact Free
        $facing = Find-SafeDistance -Item $loop -Source $line -From '200 mm, 0, 0' -Direction x -MaxDistance '10 m'
        $tilted = Find-SafeDistance -Item $loop -Source $line -From '200 mm, 0, 0' -Direction x -MaxDistance '10 m' -Tilt '60 deg'
        $facing.DistanceMeters | Should -BeGreaterThan 0.5
        $tilted.DistanceMeters | Should -BeGreaterThan 0
        $tilted.DistanceMeters | Should -BeLessThan (0.6 * $facing.DistanceMeters) -Because 'a loop turned 60 degrees links about half the flux'
        $row = [pscustomobject]@{ Name = 'Cable loop'; Material = 'Copper'; Diameter = '300 mm'; WireDiameter = '4 mm'; Gap = '5 mm'; Contact = 'Free'; Tilt = '60 deg' }
        ($row | Find-SafeDistance -Source $line -From '200 mm, 0, 0' -Direction x -MaxDistance '10 m').DistanceMeters | Should -Be $tilted.DistanceMeters
    }

    It 'takes a station''s Tilt along the ray, under -Normal' {
        $siteFile = Join-Path $TestDrive 'feeder-site.psd1'
        @'
@{
    Site = 'Feeder bay'
    Stations = @(
        @{ Name = 'Cable tray'; Position = '200 mm, 0, 0'; Tilt = '60 deg'
           Sources = @( @{ Form = 'Conductor'; Name = 'Feeder'; Waveform = @{ Form = 'Sine'; Amplitude = '50 kA'; Frequency = '10 kHz' } } ) }
    )
}
'@ | Set-Content -LiteralPath $siteFile
        $site = Import-HazardSite $siteFile
        $line = New-FieldWaveform -Sine -Amplitude '50 kA' -Frequency '10 kHz' | New-FieldSource -Conductor -Name 'Feeder'
        $loop = New-ConductiveItem -Name 'Cable loop' -Material Copper -Diameter '300 mm' -WireDiameter '4 mm' -Gap '5 mm' -Contact Free
        $tilted = Find-SafeDistance -Item $loop -Source $line -From '200 mm, 0, 0' -Direction x -MaxDistance '10 m' -Tilt '60 deg'
        $facing = Find-SafeDistance -Item $loop -Source $line -From '200 mm, 0, 0' -Direction x -MaxDistance '10 m'
        (Find-SafeDistance -Item $loop -Site $site -Station 'Cable tray' -Direction x -MaxDistance '10 m').DistanceMeters | Should -Be $tilted.DistanceMeters
        (Find-SafeDistance -Item $loop -Site $site -Station 'Cable tray' -Direction x -MaxDistance '10 m' -Tilt '0 deg').DistanceMeters | Should -Be $facing.DistanceMeters -Because '-Tilt stands over the station''s'
        (Find-SafeDistance -Item $loop -Site $site -Station 'Cable tray' -Direction x -MaxDistance '10 m' -Normal x).DistanceMeters | Should -Be 0 -Because 'a loop edge-on to the line''s circling field links none of it'
    }

    It 'searches for a row''s own ExposureTime as -ExposureTime would' {
        $heater = New-FieldWaveform -Sine -Amplitude '2 kA' -Frequency '12 kHz' | New-FieldSource -Coil -Radius '100 mm' -Turns 10 -Name 'Heater coil'
        $row = 'Name,Material,Diameter,WireDiameter,Contact,ExposureTime', 'Loose ring,Copper,20 mm,2 mm,Free,10 s' | ConvertFrom-Csv
        $item = New-ConductiveItem -Name 'Loose ring' -Material Copper -Diameter '20 mm' -WireDiameter '2 mm' -Contact Free
        $fromRow = $row | Find-SafeDistance -Source $heater -From '0, 0, 50 mm' -Direction z -MaxDistance '3 m'
        $given = $item | Find-SafeDistance -Source $heater -From '0, 0, 50 mm' -Direction z -MaxDistance '3 m' -ExposureTime '10 s'
        $default = $item | Find-SafeDistance -Source $heater -From '0, 0, 50 mm' -Direction z -MaxDistance '3 m'
        $fromRow.DistanceMeters | Should -Be $given.DistanceMeters
        $fromRow.DistanceMeters | Should -BeLessThan $default.DistanceMeters -Because 'ten seconds in the field heat the ring less than a continuous field does'
    }
}
