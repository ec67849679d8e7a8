# The Marrowby Heath Field Laboratory: an invented site with invented equipment, for the demonstration.
# Each station names its sources (a shape and the waveform that drives it), where an item sits in the field
# (Position, the loop's centre; Normal, how it faces, or the worst orientation when omitted), and how long a
# person stays (ExposureTime). Read with Import-HazardSite: as data, no code runs.
@{
    Site     = 'Marrowby Heath Field Laboratory'
    Stations = @(
        @{
            Name        = 'Switchroom B busbar'
            Description = 'A hand at the rear of the panel, 250 mm from the main busbar, when it faults at 40 kA.'
            Sources     = @(
                @{
                    Form      = 'Busbar'
                    Name      = 'Busbar B1 fault'
                    Width     = '120 mm'
                    Thickness = '10 mm'
                    Axis      = 'z'
                    Waveform  = @{ Form = 'Fault'; Current = '40 kA'; XOverR = 14; Frequency = '50 Hz'; ClearingTime = '200 ms' }
                }
            )
            Position    = '250 mm, 0, 0'
        }
        @{
            Name        = 'Switchroom B visitor walkway'
            Description = 'Visitors on a tour pass 2.5 m from the main busbar while it carries its 3 kA load.'
            Sources     = @(
                @{
                    Form      = 'Busbar'
                    Name      = 'Busbar B1 load'
                    Width     = '120 mm'
                    Thickness = '10 mm'
                    Axis      = 'z'
                    Waveform  = @{ Form = 'Sine'; Amplitude = '4.24 kA'; Frequency = '50 Hz' }
                }
            )
            Position    = '2.5 m, 0, 0'
            # Visitors are members of the public: their own exposure is judged against the public's limits.
            Policy      = @{ Name = 'Marrowby Heath visitor rules'; ExposureGroup = 'Public' }
        }
        @{
            Name        = 'Pulse cell P2 coil'
            Description = 'A hand 60 mm above the pulse coil when the capacitor bank fires.'
            Sources     = @(
                @{
                    Form     = 'Coil'
                    Name     = 'P2 pulse coil'
                    Radius   = '80 mm'
                    Turns    = 12
                    Axis     = 'z'
                    Waveform = @{ Form = 'Discharge'; Capacitance = '4 mF'; Voltage = '6 kV'; Inductance = '120 uH'; Resistance = '40 mohm'; Crowbar = $true }
                }
            )
            Position    = '0, 0, 60 mm'
        }
        @{
            Name        = 'Magnet M1 bore during a quench'
            Description = 'A person at the bore entrance when the magnet quenches from 7 T.'
            Sources     = @(
                @{ Form = 'Uniform'; Name = 'M1 quench'; Direction = 'z'; Waveform = @{ Form = 'Decay'; From = '7 T'; TimeConstant = '0.4 s' } }
            )
        }
        @{
            Name        = 'Magnet M1 ramp'
            Description = 'A technician at the bore while the magnet is ramped to 7 T over ten minutes.'
            Sources     = @(
                @{ Form = 'Uniform'; Name = 'M1 ramp'; Direction = 'z'; Waveform = @{ Form = 'Ramp'; From = '0 T'; To = '7 T'; Duration = '10 min' } }
            )
        }
        @{
            Name         = 'Induction furnace F1 coil mouth'
            Description  = 'A hand at the coil mouth, in the hall''s warm air, for two minutes while a billet is loaded.'
            Sources      = @(
                @{ Form = 'Uniform'; Name = 'F1 coil mouth'; Waveform = @{ Form = 'Sine'; Amplitude = '1.5 mT'; Frequency = '9.6 kHz' } }
            )
            ExposureTime = '2 min'
            AmbientTemperature = '35 degC'
        }
    )
}
