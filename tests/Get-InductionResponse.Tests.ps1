param([string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'))

BeforeAll {
    Import-Module $ModulePath -Force
    $ring = New-ConductiveItem -Name 'Test ring' -Material Copper -Diameter '20 mm' -WireDiameter '2 mm' -Contact Free
    $split = New-ConductiveItem -Name 'Split ring' -Material Copper -Diameter '20 mm' -WireDiameter '2 mm' -Gap '1 mm'
}

Describe 'Get-InductionResponse' {
    # Validates: emf of a split ring from the cmdlet | Faraday's law | 1e-12
    It 'gives the emf amplitude omega B A of a loop facing a sinusoidal uniform field (Faraday)' {
        $field = New-FieldWaveform -Sine -Amplitude '10 mT' -Frequency '50 Hz' | New-FieldSource -Uniform
        $r = Get-InductionResponse -Item $split -Source $field
        $expected = 2 * [math]::PI * 50 * 0.01 * [math]::PI * 0.01 * 0.01
        [math]::Abs($r.PeakEmfVolts - $expected) / $expected | Should -BeLessThan 1e-12
        $r.GapVoltageVolts | Should -Be $r.PeakEmfVolts
        $r.PeakCurrentAmperes | Should -Be 0
    }

    It 'links no flux when the loop is turned edge-on to the field' {
        $field = New-FieldWaveform -Sine -Amplitude '10 mT' -Frequency '50 Hz' | New-FieldSource -Uniform -Direction z
        (Get-InductionResponse -Item $split -Source $field -Normal x).PeakEmfVolts | Should -Be 0
    }

    It 'reports the circuit current beside the naive e/R, and the inductive limit of a fast ramp' {
        $fast = New-FieldWaveform -Ramp -From 0 -To '1 T' -Duration '100 ns' | New-FieldSource -Uniform
        $r = Get-InductionResponse -Item $ring -Source $fast
        $r.NaiveCurrentAmperes | Should -BeGreaterThan (100 * $r.PeakCurrentAmperes)
        # The skin depth of a 100 ns ramp (about 20 um) puts the current on the wire's surface (filaments over its
        # section); the surface resistance lets it decay by a few per cent during the ramp, so the peak lies just
        # below the inductive limit.
        $r.PathCount | Should -BeGreaterThan 1
        $r.PeakCurrentAmperes | Should -BeLessThan $r.InductiveLimitCurrentAmperes
        (1 - $r.PeakCurrentAmperes / $r.InductiveLimitCurrentAmperes) | Should -BeLessThan 0.05
        $r.Regime | Should -Match '^inductive'
    }

    It 'describes the sense of the current in plain words (Lenz)' {
        $rising = New-FieldWaveform -Ramp -From 0 -To '1 T' -Duration '1 s' | New-FieldSource -Uniform
        (Get-InductionResponse -Item $ring -Source $rising).CurrentSense | Should -Match '^anticlockwise viewed looking along the field \(\+z\)'
        $falling = New-FieldWaveform -Ramp -From '1 T' -To 0 -Duration '1 s' | New-FieldSource -Uniform
        (Get-InductionResponse -Item $ring -Source $falling).CurrentSense | Should -Match '^clockwise'
    }

    It 'carries the time series of emf, current and temperature' {
        $pulse = New-FieldWaveform -Ramp -From 0 -To '20 T' -Duration '10 ms' | New-FieldSource -Uniform
        $r = Get-InductionResponse -Item $ring -Source $pulse
        $r.CircuitSeries.Count | Should -BeGreaterThan 10
        $r.HeatingSeries.Count | Should -BeGreaterThan 10
        ($r.HeatingSeries.TemperatureCelsius | Measure-Object -Maximum).Maximum | Should -Be $r.PeakTemperatureCelsius
        $r.PeakTemperatureCelsius | Should -BeGreaterThan $r.InitialTemperatureCelsius
    }

    It 'starts a worn item at skin temperature and a loose one at ambient' {
        $field = New-FieldWaveform -Sine -Amplitude '1 uT' -Frequency '50 Hz' | New-FieldSource -Uniform
        (Get-InductionResponse -Item $split -Source $field).InitialTemperatureCelsius | Should -Be 33
        (Get-InductionResponse -Item $ring -Source $field -AmbientTemperature '25 degC').InitialTemperatureCelsius | Should -Be 25
    }

    It 'says with -Verbose which model it used' {
        $field = New-FieldWaveform -Sine -Amplitude '1 mT' -Frequency '50 Hz' | New-FieldSource -Uniform
        $verbose = Get-InductionResponse -Item $ring -Source $field -Verbose 4>&1 | Where-Object { $_ -is [System.Management.Automation.VerboseRecord] }
        ($verbose.Message -join ' ') | Should -Match 'Grover'
    }

    It 'says which model it used when the caller''s VerbosePreference asks, and keeps quiet otherwise' {
        $field = New-FieldWaveform -Sine -Amplitude '1 mT' -Frequency '50 Hz' | New-FieldSource -Uniform
        $asked = & { $VerbosePreference = 'Continue'; Test-InductionHazard -Item $ring -Source $field 4>&1 } | Where-Object { $_ -is [System.Management.Automation.VerboseRecord] }
        ($asked.Message -join ' ') | Should -Match 'Grover'
        $declined = & { $VerbosePreference = 'Continue'; Test-InductionHazard -Item $ring -Source $field -Verbose:$false 4>&1 } | Where-Object { $_ -is [System.Management.Automation.VerboseRecord] }
        $declined | Should -BeNullOrEmpty
        $quiet = & { $VerbosePreference = 'SilentlyContinue'; Test-InductionHazard -Item $ring -Source $field 4>&1 } | Where-Object { $_ -is [System.Management.Automation.VerboseRecord] }
        $quiet | Should -BeNullOrEmpty
    }

    It 'takes hashtables as items' {
        $field = New-FieldWaveform -Sine -Amplitude '1 mT' -Frequency '50 Hz' | New-FieldSource -Uniform
        $r = @{ Name = 'From a hashtable'; Material = 'Silver'; InnerDiameter = '17 mm'; Width = '3 mm'; Thickness = '1.5 mm' } | Get-InductionResponse -Source $field
        $r.ItemName | Should -Be 'From a hashtable'
    }
}
