param([string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'))

# A fixed-seed corpus of hostile inputs through the cmdlets as a user drives them. INDUCTIONHAZARD_FUZZ_ROWS and
# INDUCTIONHAZARD_FUZZ_SETS (and INDUCTIONHAZARD_FUZZ_SEED) make a longer or different run on demand.

BeforeAll {
    Import-Module $ModulePath -Force
    $seed = if ($env:INDUCTIONHAZARD_FUZZ_SEED) { [int] $env:INDUCTIONHAZARD_FUZZ_SEED } else { 20261201 }
    $rowCount = if ($env:INDUCTIONHAZARD_FUZZ_ROWS) { [int] $env:INDUCTIONHAZARD_FUZZ_ROWS } else { 10000 }
    $setCount = if ($env:INDUCTIONHAZARD_FUZZ_SETS) { [int] $env:INDUCTIONHAZARD_FUZZ_SETS } else { 1000 }
    $random = [System.Random]::new($seed)
    function Pick([object[]] $values) { $values[$random.Next($values.Count)] }
    $goodLengths = '20 mm', '2 mm', '1.5 mm', '65 mm', '0.02', '18 mm', '4 mm', '3/4 in'
    $badLengths = '', ' ', 'NaN', '-Infinity', '1e400', '1e308 km', '١٨ mm', '0x10', '20 MM', '1,5 mm', '-3 mm', '180 m', '5 A', '3 T', '1 nm', 'abc', '18', '0', '1e-300 m'
    function Length { if ($random.Next(5) -eq 0) { Pick $badLengths } else { Pick $goodLengths } }
    $materials = 'Copper', 'Gold', 'Silver', 'SS304', 'Titanium', 'Brass', 'Aluminium', 'mild steel', 'Unobtainium', '', 'COPPER', 'Ti-6Al-4V'
    $contacts = 'Skin', 'Held', 'Free', 'Fixed', 'Worn', 'Loose', '', 'Sideways'
    $shapes = 'Ring', 'Ring', 'Ring', 'RectangularLoop', 'Disc', ''
    $sources = @(
        (New-FieldWaveform -Ramp -From '0 T' -To '3 T' -Duration '10 ms' | New-FieldSource -Name 'ramp')
        (New-FieldWaveform -Sine -Amplitude '4 mT' -Frequency '12 kHz' -Duration '1 min' | New-FieldSource -Name 'heater')
        (New-FieldWaveform -Fault -Current '40 kA' -XOverR 14 -Frequency '50 Hz' -ClearingTime '200 ms' | New-FieldSource -Conductor -Center '0, 100 mm, 0' -Name 'feeder')
    )
    function Show-Counts([string] $what, [int] $inputs, [int] $outputs, [object[]] $errors) {
        Write-Host "$what`: $inputs inputs, $outputs outputs, $($errors.Count) errors"
        $errors | Group-Object { $_.FullyQualifiedErrorId.Split(',')[0] } | Sort-Object Count -Descending |
            ForEach-Object { Write-Host ('  {0,-22} {1,6}' -f $_.Name, $_.Count) }
    }
}

Describe 'Hostile input (fixed-seed corpus)' {
    It 'gives every one of the rows exactly one assessment or one error naming the row, and never an unfounded Clear' {
        $rows = foreach ($k in 1..$rowCount) {
            # Three rows in four are items people keep (a wire ring, a band, a frame) with the odd hostile cell; the
            # fourth is any mix of columns at all.
            $kind = $random.Next(4)
            $row = [ordered]@{ Name = "fuzz $k"; Shape = 'Ring'; Material = Pick $materials; Diameter = ''; WireDiameter = ''; Width = ''; Thickness = ''; Height = ''; Length = ''; WallThickness = ''; ClosedEnds = ''; Gap = ''; Contact = Pick $contacts; X = ''; Y = ''; Z = ''; Velocity = ''; AmbientTemperature = ''; Tilt = '' }
            # One row in twenty is a solid body with its own fields (and the odd hostile one).
            if ($random.Next(20) -eq 0) { $kind = 4 }
            switch ($kind) {
                4 {
                    $row.Shape = Pick 'Disc', 'Cylinder', 'Tube', 'Sphere', 'Plate', 'Bar'
                    switch ($row.Shape) {
                        'Disc' { $row.Diameter = Length; $row.Thickness = Pick '2 mm', '1 mm', (Length) }
                        'Cylinder' { $row.Diameter = Pick '10 mm', '6 mm', (Length); $row.Length = Pick '40 mm', '100 mm', (Length) }
                        'Tube' { $row.Diameter = Pick '40 mm', '60 mm', (Length); $row.WallThickness = Pick '1 mm', '2 mm', (Length); $row.Length = Pick '50 mm', '150 mm', (Length); $row.ClosedEnds = Pick 'yes', '', 'true', 'maybe' }
                        'Sphere' { $row.Diameter = Length }
                        'Plate' { $row.Width = Pick '40 mm', '30 mm', (Length); $row.Height = Pick '30 mm', '20 mm', (Length); $row.Thickness = Pick '1 mm', '0.5 mm', (Length) }
                        default { $row.Width = Pick '10 mm', '8 mm', (Length); $row.Height = Pick '10 mm', (Length); $row.Length = Pick '30 mm', '50 mm', (Length) }
                    }
                }
                0 { $row.Diameter = Length; $row.WireDiameter = Length }
                1 { $row.Diameter = Length; $row.Width = Length; $row.Thickness = Length }
                2 { $row.Shape = 'RectangularLoop'; $row.Width = Pick '300 mm', '400 mm', '1 m', (Length); $row.Height = Pick '200 mm', '60 mm', (Length); $row.WireDiameter = Length }
                default { $row.Shape = Pick $shapes; $row.Diameter = Length; $row.WireDiameter = Length; $row.Width = Length; $row.Height = Length; $row.Thickness = Length }
            }

            if ($random.Next(3) -eq 0) { $row.Gap = Length }
            if ($random.Next(2) -eq 0) { $row.X = Pick '0', '300 mm', '0.5 m', '200 mm', 'NaN', '1e400 mm'; $row.Y = Pick '0', '0', '10 mm', '100 mm', ''; $row.Z = '0' }
            # A row's own motion and air, now read per row, with the odd hostile cell.
            if ($random.Next(4) -eq 0) { $row.Velocity = Pick '0, 0, 1.5 m/s', '0, 0, 0', '1.5, 0, 0', 'NaN m/s, 0, 0', '0, 0, 300 m/s', 'z', '1e400 m/s, 0, 0', '0; 0; 1 m/s' }
            if ($random.Next(8) -eq 0) { $row.Tilt = Pick '30 deg', '90 deg', '0', '120 deg', '30', 'NaN deg', '1 rad' }
            if ($random.Next(4) -eq 0) { $row.AmbientTemperature = Pick '25 degC', '35 degC', '35', '-300 degC', 'NaN degC', '60 degC', '3 T', '95 degF' }
            [pscustomobject]$row
        }
        $perSource = [math]::Ceiling($rows.Count / $sources.Count)
        $outputs = 0
        $allErrors = [System.Collections.Generic.List[object]]::new()
        for ($s = 0; $s -lt $sources.Count; $s++) {
            $slice = @($rows | Select-Object -Skip ($s * $perSource) -First $perSource)
            # A row at X = 0, Y = 100 mm sits on the feeder, which must be an error or Indeterminate, never a number.
            $results = @($slice | Test-InductionHazard -Source $sources[$s] -ThrottleLimit 2 -ErrorVariable bad -ErrorAction SilentlyContinue -WarningAction SilentlyContinue)
            $outputs += $results.Count
            $allErrors.AddRange(@($bad))
            ($results.Count + $bad.Count) | Should -Be $slice.Count -Because "every input of source $s gives one output or one error"
            foreach ($a in $results | Where-Object Verdict -EQ 'Clear') {
                [double]::IsNaN($a.MinimumMargin) | Should -BeFalse
                $a.MinimumMargin | Should -BeGreaterOrEqual $a.SafetyFactor
                [double]::IsNaN($a.PeakEmfVolts) | Should -BeFalse
            }
            foreach ($e in $bad) {
                $e.FullyQualifiedErrorId | Should -Not -BeLike 'AssessmentFailed*' -Because "an unexpected failure is a defect: $($e.Exception.Message)"
                $e.Exception.Message | Should -Match '^row \d+' -Because 'an error names its row'
            }
        }
        Show-Counts 'rows' $rows.Count $outputs $allErrors.ToArray()
        ($outputs + $allErrors.Count) | Should -Be $rows.Count
    }

    It 'answers every one of the parameter sets with an object or an error of its own, never an unhandled exception' {
        $fuzzRing = New-ConductiveItem -Name 'fuzz ring' -Material Copper -Diameter '20 mm' -WireDiameter '2 mm' -Gap '1 mm'
        $fuzzAssessment = $fuzzRing | Test-InductionHazard -Source $sources[1]
        $values = @('1 T', '0 T', '40 kA', '50 Hz', '10 ms', '2 s', '', 'NaN', '1e400', '-5 T', '0', '1e17 s', '3 mm', 'abc', '١ T', '15 kG', '1,5 T', '1/2 s', $null, 1, -1, 0, 1e300)
        $objects = 0
        $errors = [System.Collections.Generic.List[object]]::new()
        foreach ($k in 1..$setCount) {
            $form = Pick 'Ramp', 'Sine', 'Fault', 'Discharge', 'Decay', 'Trapezoid', 'Item', 'Source', 'Exposure', 'Distance', 'Report', 'Assess', 'Field', 'Material'
            $p = switch ($form) {
                'Ramp' { @{ Ramp = $true; From = Pick $values; To = Pick $values; Duration = Pick $values; Start = Pick $values } }
                'Sine' { @{ Sine = $true; Amplitude = Pick $values; Frequency = Pick $values; PhaseDegrees = Pick $values } }
                'Fault' { @{ Fault = $true; Current = Pick $values; XOverR = Pick 14, 0, -1, 1e9, 0.5; Frequency = Pick $values; ClearingTime = Pick $values } }
                'Discharge' { @{ Discharge = $true; Capacitance = Pick '2 mF', '0 F', '-1 F', 'abc'; Voltage = Pick '5 kV', '', '1e400 V'; Inductance = Pick '50 uH', '0 H'; Resistance = Pick '30 mohm', '-1 ohm' } }
                'Decay' { @{ Decay = $true; From = Pick $values; TimeConstant = Pick $values } }
                'Trapezoid' { @{ Trapezoid = $true; Amplitude = Pick $values; RiseTime = Pick $values; FallTime = Pick $values; FlatTime = Pick $values } }
                'Item' { @{ Name = 'fuzz'; Material = Pick $materials; Diameter = Length; WireDiameter = Length; Gap = Pick '0', '1 mm', '1 nm', 'NaN' } }
                'Exposure' { @{ Source = $sources[0]; Position = Pick '0,0,0', '1 m,0,0', 'NaN,0,0', '1e308 km,0,0', '3 T,0,0', ''; Policy = Pick @{ SafetyFactor = Pick 3, 0.5, 'NaN', '' }, @{ Colour = 'red' }, @{ AlternatingVoltageLimit = Pick '25 V', '25 A', -1 } } }
                'Distance' { @{ Item = $fuzzRing; Source = $sources[1]; Direction = Pick 'x', 'z', '0,0,0', 'NaN,0,0', '1e200,0,0', 'q'; MaxDistance = Pick '50 mm', '0', '-1 m', '1e9 m', 'abc', '3 T'; From = Pick '0,0,0', '1e308 km,0,0', ''; Policy = Pick @{}, @{ SafetyFactor = 200 } } }
                'Report' { @{ InputObject = $fuzzAssessment; Path = Join-Path $TestDrive ('r' + $random.Next(20) + (Pick '.html', '.md', '.csv', '.json', '.txt', '')); Format = Pick 'Html', 'Json', 'Pdf', ''; Title = Pick 'Audit', '<b>x</b>', '=cmd|x', ''; Force = $true; PassThru = $true } }
                'Assess' { @{ Item = $fuzzRing; Source = $sources[0]; Position = Pick '0,0,0', '1e308 km,0,0', 'NaN,0,0', '3 T,0,0', '0, 0, 5 mm'; Normal = Pick 'z', '0,0,0', 'NaN,1,0', '1e200,0,0'; Velocity = Pick '0,0,0', '1 m/s,0,0', '100 m/s,0,0', '-1,0,0', 'NaN,0,0'; ExposureTime = Pick $values; LeaveTime = Pick $values; AmbientTemperature = Pick '20 degC', '-300 degC', '1000 degC', 'NaN', '5 K', '' } }
                'Field' { @{ Source = $sources[2]; Position = Pick '0,0,0', '0, 100 mm, 0', '1e308 km,0,0', 'NaN,0,0', '3 T,0,0', 'q', '0,0' } }
                'Material' { @{ Definition = @{ Name = 'fuzz metal'; Resistivity = Pick '2e-8 ohm m', '-1', 'NaN', '1e300', ''; Density = Pick '8 g/cm3', '0', '-5', 'abc'; SpecificHeat = Pick '400 J/(kg K)', '0', '1e400'; MeltingTemperature = Pick '1000 degC', '-500 K', 'NaN'; TemperatureCoefficient = Pick 0.004, -1, 'NaN', 1e300 } } }
                'Source' { @{ Conductor = $true; Waveform = (New-FieldWaveform -Sine -Amplitude '1 kA' -Frequency '50 Hz'); Axis = Pick 'z', '1e200,0,0', '0,0,0', 'NaN,0,0', 'q'; Center = Pick '0,0,0', '1e308 km,0,0', '3 T,0,0' } }
            }
            foreach ($key in @($p.Keys)) { if ($null -eq $p[$key]) { $p[$key] = '' } }
            $command = switch ($form) { 'Item' { 'New-ConductiveItem' } 'Source' { 'New-FieldSource' } 'Exposure' { 'Test-FieldExposure' } 'Distance' { 'Find-SafeDistance' } 'Report' { 'Export-HazardReport' } 'Assess' { 'Test-InductionHazard' } 'Field' { 'Get-FieldStrength' } 'Material' { 'Get-ConductorMaterial' } default { 'New-FieldWaveform' } }
            if ($form -eq 'Report' -and $p.Format -eq '') { $p.Remove('Format') }
            try {
                $result = & $command @p -ErrorAction Stop -WarningAction SilentlyContinue
                if ($null -ne $result) { $objects++ }
                foreach ($a in @($result) | Where-Object { $_ -is [InductionHazard.Assessment.InductionAssessment] -and $_.Verdict -eq 'Clear' }) {
                    [double]::IsFinite($a.MinimumMargin) -and $a.MinimumMargin -ge $a.SafetyFactor | Should -BeTrue -Because 'a Clear stands on finite margins at or above the factor'
                    [double]::IsFinite($a.PeakEmfVolts) -and [double]::IsFinite($a.PeakTemperatureCelsius) | Should -BeTrue
                }
            }
            catch [System.Management.Automation.ParameterBindingException] { $errors.Add($_) }
            catch {
                $_.FullyQualifiedErrorId | Should -Match '^(InvalidInput|InvalidQuantity|InvalidRecord|MissingUnit|UnusualSize|UnknownMaterial|FieldNotEvaluable|ParameterArgumentTransformationError|ParameterArgumentValidationError|MissingArgument|MissingMandatoryParameter|AmbiguousParameterSet|NamedParameterNotFound|CannotConvertArgumentNoMessage|PositionalParameterNotFound|InvalidPolicyFile|ReportFormatUnknown|ReportExists|ReportEmpty)' -Because "$command $($p.Keys -join ' ') failed with: $($_.Exception.Message)"
                $errors.Add($_)
            }
        }
        Show-Counts 'parameter sets' $setCount $objects $errors.ToArray()
        ($objects + $errors.Count) | Should -Be $setCount
    }

    It 'reads every one of 200 hostile policy files as a valid policy, or refuses it naming the key or the code' {
        $random = [System.Random]::new($seed + 3)
        $entries = @(
            "SafetyFactor = 3", "SafetyFactor = 0.5", "SafetyFactor = 'NaN'", "SafetyFactor = 1e300",
            "AlternatingVoltageLimit = '25 V'", "AlternatingVoltageLimit = '25 A'", "AlternatingVoltageLimit = -1", "AlternatingVoltageLimit = '1,5 V'",
            "DirectVoltageLimit = '60 V'", "DirectVoltageLimit = '1e308 V'", "ThermalDoseLimit = 1", "ThermalDoseLimit = 'abc'",
            "TouchTime = '2 s'", "TouchTime = '2 T'", "ImpulseChargeLimit = '20 uC'", "ImpulseChargeLimit = '20 V'", "BodyResistance = '1 kohm'", "BodyResistance = '1 ohm'", "StaticExposureLimit = '8 T'", "StaticExposureLimit = '9 T'", "LaunchSpeedLimit = '2 m/s'", "LaunchSpeedLimit = '200 m/s'",
            "Name = 'Bay rules'", "Colour = 'red'", "SafetyFactor = (Get-Random)", "TouchTime = `$env:HOME"
        )
        $read = 0
        $refused = [System.Collections.Generic.List[object]]::new()
        foreach ($k in 1..200) {
            $chosen = foreach ($n in 1..($random.Next(4) + 1)) { Pick $entries }
            $names = @($chosen | ForEach-Object { ($_ -split '=')[0].Trim() })
            if (($names | Select-Object -Unique).Count -ne $names.Count) { $chosen = $chosen | Select-Object -First 1 }
            $body = if ($random.Next(15) -eq 0) { "Remove-Item ./x" } else { "@{ $($chosen -join '; ') }" }
            $file = Join-Path $TestDrive "policy-$k.psd1"
            Set-Content $file -Value $body
            try {
                $policy = Get-HazardPolicy $file
                $policy.SafetyFactor | Should -BeGreaterOrEqual 1
                foreach ($limit in $policy.Limits | Where-Object { -not [double]::IsNaN($_.Value) }) { [double]::IsFinite($limit.Value) -and $limit.Value -gt 0 | Should -BeTrue }
                $read++
            }
            catch {
                $_.FullyQualifiedErrorId | Should -BeLike 'InvalidPolicyFile,*' -Because $_.Exception.Message
                $_.Exception.Message | Should -Match '(SafetyFactor|AlternatingVoltageLimit|DirectVoltageLimit|ThermalDoseLimit|TouchTime|ImpulseChargeLimit|BodyResistance|StaticExposureLimit|LaunchSpeedLimit|Colour|holds code|one hashtable|does not parse)' -Because $_.Exception.Message
                $refused.Add($_)
            }
        }

        Show-Counts 'policy files' 200 $read $refused.ToArray()
        $read | Should -BeGreaterThan 10
        $refused.Count | Should -BeGreaterThan 10
    }

    It 'reads every one of 200 hostile site files or refuses it as an invalid site file' {
        # Its own stream, so that the other corpora's draws do not change this one.
        $random = [System.Random]::new($seed + 2)
        $fragments = @(
            "Form = 'Uniform'; Waveform = @{ Form = 'Sine'; Amplitude = '1 mT'; Frequency = '50 Hz' }"
            "Form = 'Coil'; Radius = '50 mm'; Turns = 3; Waveform = @{ Form = 'Ramp'; From = '0 A'; To = '1 kA'; Duration = '1 s' }"
            "Form = 'Busbar'; Width = '100 mm'; Thickness = '10 mm'; Waveform = @{ Form = 'Fault'; Current = '40 kA'; XOverR = 14; Frequency = '50 Hz' }"
            "Form = 'Coil'; Radius = '50 mm'; Waveform = @{ Form = 'Sine'; Amplitude = '1 T'; Frequency = '50 Hz' }"
            "Form = 'Warp'; Waveform = @{ Form = 'Sine'; Amplitude = '1 mT'; Frequency = '50 Hz' }"
            "Form = 'Uniform'; Waveform = @{ Form = 'Sine'; Amplitude = (Get-Date); Frequency = '50 Hz' }"
            "Form = 'Uniform'; Waveform = @{ Form = 'Sine'; Amplitude = `$env:PATH; Frequency = '50 Hz' }"
            "Form = 'Uniform'"
            "Form = 'Uniform'; Waveform = @{ Form = 'Sine'; Amplitude = 'NaN'; Frequency = '50 Hz' }"
            "Form = 'Map'; Path = 'no-such-map.csv'; Waveform = @{ Form = 'Sine'; Amplitude = '1 mT'; Frequency = '50 Hz' }"
        )
        $extras = @('', "Position = '0, 300 mm, 0'", "Position = 'x'", "ExposureTime = '2 min'", "ExposureTime = '1 ms'", "Normal = 'z'", "Normal = '0,0,0'", "Colour = 'red'", "AmbientTemperature = '35 degC'", "AmbientTemperature = '500 degC'", "AmbientTemperature = 'warm'", "Tilt = '30 deg'", "Tilt = '120 deg'", "Tilt = 'NaN deg'")
        $read = 0
        $refused = [System.Collections.Generic.List[object]]::new()
        foreach ($k in 1..200) {
            $stations = foreach ($n in 1..($random.Next(3) + 1)) {
                "@{ Name = 'Station $n'; Sources = @(@{ $(Pick $fragments) }); $(Pick $extras) }"
            }
            $body = if ($random.Next(10) -eq 0) { "Write-Host 'hello'" } else { "@{ Site = 'Fuzz $k'; Stations = @($($stations -join '; ')) }" }
            $file = Join-Path $TestDrive "site-$k.psd1"
            Set-Content $file -Value $body
            try {
                $site = Import-HazardSite $file
                $site.Stations.Count | Should -BeGreaterThan 0
                $read++
            }
            catch {
                $_.FullyQualifiedErrorId | Should -BeLike 'InvalidSiteFile,*' -Because $_.Exception.Message
                $refused.Add($_)
            }
        }

        Show-Counts 'site files' 200 $read $refused.ToArray()
        # Both paths reached: about one file in fifteen draws a valid station for every station, so with another
        # INDUCTIONHAZARD_FUZZ_SEED the read ones number 9 to 19 (more than 10 held for the fixed seed only).
        $read | Should -BeGreaterThan 3
        $refused.Count | Should -BeGreaterThan 10
    }
}
