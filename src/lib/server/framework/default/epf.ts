import type { AreaDef } from '../../../framework/types';

export const area: AreaDef = {
	code: 'EPF',
	name: 'Engine performance',
	tasks: [
		{
			code: 'EPF-01',
			title: 'Retrieve trouble codes and freeze-frame data with a scan tool',
			description:
				'Connect a scan tool, read codes and their status from every module, save freeze-frame data, and choose where diagnosis should start.',
			tier: 1,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{
					text: 'Verifies the complaint and checks the warning lamps come on and go out at start-up'
				},
				{
					text: 'Sets the parking brake, selects Park or Neutral and connects the scan tool with the ignition off',
					safety: true
				},
				{ text: 'Confirms battery voltage is high enough for a stable session' },
				{ text: 'Identifies the vehicle by VIN in the scan tool' },
				{
					text: 'Reads codes from all modules and records whether each is current, pending or history'
				},
				{ text: 'Saves the freeze-frame data before anything is cleared' },
				{ text: 'Checks for service bulletins that match the codes and symptom' },
				{ text: 'Chooses the code to diagnose first and follows its diagnostic procedure' },
				{
					text: 'After the repair, clears codes and confirms they do not return under the same conditions',
					safety: true
				}
			],
			specs: [
				{ label: 'Battery voltage during a scan session', value: 12.4, unit: 'V', limit: 'minimum' }
			],
			tools: ['Scan tool', 'Battery maintainer', 'Service information system'],
			cautions: [
				'Set the parking brake and select Park or Neutral before running the engine.',
				'Run engines only with exhaust extraction or good ventilation.',
				'Route the scan tool cable away from the pedals and steering.'
			],
			serviceInfo: ['diagnostic procedure', 'service bulletin', 'specifications'],
			questions: [
				{
					prompt: 'Why is freeze-frame data saved before codes are cleared?',
					options: [
						{ text: 'It is only kept for one key cycle', correct: false },
						{ text: 'Clearing codes erases it', correct: true },
						{ text: 'The scan tool cannot read it after the engine has run', correct: false },
						{ text: 'It is needed to reprogram the module', correct: false }
					],
					explanation:
						'Freeze frame is stored with the code, so clearing the code throws away the record of the conditions when it set.'
				},
				{
					prompt: 'What does freeze-frame data tell you?',
					options: [
						{
							text: 'The operating conditions when the fault was detected, so you can recreate them',
							correct: true
						},
						{ text: 'Which part to replace', correct: false },
						{ text: 'How many times the code has been cleared', correct: false },
						{ text: 'The live sensor values right now', correct: false }
					],
					explanation:
						'Speed, load, temperature and fuel trim at the moment of the fault tell you how to reproduce it and confirm a repair.'
				},
				{
					prompt: 'What does a pending code usually mean?',
					options: [
						{ text: 'The repair is pending and the code can be ignored', correct: false },
						{ text: 'The fault is severe and the lamp is flashing', correct: false },
						{
							text: 'The fault was seen once, but has not yet been confirmed on a later drive cycle',
							correct: true
						}
					],
					explanation:
						'Many faults must fail on two drive cycles before the lamp comes on, and a pending code shows the first failure.'
				},
				{
					prompt:
						'Several modules show communication codes plus a low system voltage code. Where should you start?',
					options: [
						{ text: 'Fix the low voltage or power supply fault first', correct: true },
						{ text: 'Replace the module with the most codes', correct: false },
						{ text: 'Clear all codes and see which return first', correct: false }
					],
					explanation:
						'Low voltage can make modules reset and drop off the network, so the many codes may share one cause.'
				},
				{
					prompt: 'A code names an oxygen sensor circuit. What is the right next step?',
					options: [
						{ text: 'Clear the code and return the vehicle', correct: false },
						{ text: 'Follow the diagnostic procedure for that code', correct: true },
						{ text: 'Replace the oxygen sensor', correct: false }
					],
					explanation:
						'A circuit code can come from wiring, connectors, the module or the sensor, and only testing shows which.'
				},
				{
					prompt: 'Which freeze-frame values help you recreate a fault? Choose two.',
					options: [
						{ text: 'The date of the last oil change', correct: false },
						{ text: 'The name of the last person to clear codes', correct: false },
						{ text: 'Engine speed and calculated load', correct: true },
						{ text: 'Engine coolant temperature', correct: true }
					],
					explanation:
						'Load, speed and temperature describe how the engine was running, which is what you need to reproduce.'
				}
			]
		},
		{
			code: 'EPF-02',
			title: 'Interpret short-term and long-term fuel trim',
			description:
				'Read fuel trim under different operating conditions and use it to tell whether the engine runs lean or rich, on one bank or both, and at idle or under load.',
			tier: 1,
			requiredLevel: 4,
			minHours: 3,
			checklist: [
				{ text: 'Warms the engine until the fuel system is in closed loop' },
				{ text: 'Reads short- and long-term trim for each bank at idle' },
				{ text: 'Reads them again at about 2500 rpm and under load on a road test' },
				{ text: 'Adds short-term and long-term trim to get the total correction' },
				{ text: 'Compares the banks and the readings at each operating condition' },
				{ text: 'States the likely type of fault and chooses the next test' },
				{ text: 'Records the readings on the repair order' }
			],
			specs: [
				{ label: 'Short-term fuel trim, warm idle', value: 0, unit: '%', limit: 'nominal' },
				{ label: 'Long-term fuel trim, either direction', value: 10, unit: '%', limit: 'maximum' },
				{
					label: 'Coolant temperature for closed-loop reading',
					value: 80,
					unit: '°C',
					limit: 'minimum'
				}
			],
			tools: ['Scan tool with data recording', 'Service information system'],
			cautions: [
				'On a road test, a second person watches the scan tool while the driver watches the road.',
				'Keep hands and cables clear of the fan and belts while reading data at the engine.'
			],
			serviceInfo: ['diagnostic procedure', 'specifications'],
			questions: [
				{
					prompt:
						'Long-term trim is +18 % at idle but +3 % at 2500 rpm. What is the most likely cause?',
					options: [
						{ text: 'A clogged air filter', correct: false },
						{ text: 'A vacuum leak', correct: true },
						{ text: 'A weak fuel pump', correct: false },
						{ text: 'A leaking injector', correct: false }
					],
					explanation:
						'A fixed leak lets in a large share of the air at idle but a small share at higher airflow, so the lean correction shrinks as rpm rises.'
				},
				{
					prompt: 'What does a positive fuel trim mean?',
					options: [
						{
							text: 'The module is adding fuel because the oxygen sensor sees a lean mixture',
							correct: true
						},
						{ text: 'The engine is running rich', correct: false },
						{ text: 'The module is removing fuel', correct: false },
						{ text: 'The fuel tank is more than half full', correct: false }
					],
					explanation:
						'Trim is the correction the module applies, and a positive value means more fuel is being added.'
				},
				{
					prompt:
						'Both banks show about +15 % at idle, at 2500 rpm and under load. Which causes fit? Choose two.',
					options: [
						{ text: 'Low fuel pressure', correct: true },
						{ text: 'An airflow sensor reading less air than is entering', correct: true },
						{ text: 'A single leaking injector', correct: false },
						{ text: 'An exhaust leak ahead of the bank 1 oxygen sensor', correct: false }
					],
					explanation:
						'A lean correction on both banks at every speed points to something common to the whole engine, such as fuel supply or metered airflow.'
				},
				{
					prompt: 'Only bank 2 shows +20 % while bank 1 is near 0 %. What does that tell you?',
					options: [
						{ text: 'The fuel pump is weak', correct: false },
						{ text: 'The airflow sensor is faulty', correct: false },
						{ text: 'The cause affects only bank 2, such as a leak on that side', correct: true }
					],
					explanation:
						'Faults shared by both banks would show on both, so a one-sided trim points to something on that bank alone.'
				},
				{
					prompt: 'Why must the engine be in closed loop when you judge fuel trim?',
					options: [
						{
							text: 'Short-term trim only responds to the oxygen sensor in closed loop',
							correct: true
						},
						{ text: 'Trim values are only stored with the engine off', correct: false },
						{ text: 'Closed loop is the only mode in which the injectors fire', correct: false }
					],
					explanation:
						'In open loop the module ignores the oxygen sensor and uses set values, so the trim does not reflect the real mixture.'
				},
				{
					prompt: 'Long-term trim is −20 %. Which is a likely cause?',
					options: [
						{ text: 'A restricted fuel filter', correct: false },
						{ text: 'A weak fuel pump', correct: false },
						{ text: 'A leaking injector or fuel pressure that is too high', correct: true },
						{ text: 'A vacuum leak', correct: false }
					],
					explanation:
						'A negative trim means the module is taking fuel away, so extra fuel is getting in from somewhere.'
				}
			]
		},
		{
			code: 'EPF-03',
			title: 'Test fuel pressure and volume',
			description:
				'Measure fuel supply pressure, how well it holds after shut-off and the volume the pump delivers, on a port-injected low-pressure system, without spilling fuel or creating a fire risk.',
			tier: 1,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{
					text: 'Puts on eye protection, removes ignition sources and has a fire extinguisher within reach',
					safety: true
				},
				{
					text: 'Relieves fuel pressure as the procedure directs before opening anything',
					safety: true
				},
				{
					text: 'Connects the gauge with the correct adapter, with a shop towel around the fitting',
					safety: true
				},
				{
					text: 'Switches the pump on and checks the gauge and fittings for leaks',
					safety: true
				},
				{
					text: 'Reads pressure at key-on, at idle and when the throttle is snapped or the engine is loaded'
				},
				{ text: 'Switches off and watches how well pressure holds' },
				{ text: 'Measures pump volume into an approved container' },
				{
					text: 'Relieves pressure, removes the gauge, caps the port and checks for leaks with the engine running',
					safety: true
				}
			],
			specs: [
				{ label: 'Fuel pressure, engine idling', value: 55, unit: 'psi', limit: 'nominal' },
				{
					label: 'Pressure held five minutes after switch-off',
					value: 40,
					unit: 'psi',
					limit: 'minimum'
				},
				{ label: 'Fuel volume delivered in 15 seconds', value: 0.5, unit: 'L', limit: 'minimum' }
			],
			tools: [
				'Fuel pressure gauge with adapters and bleed hose',
				'Approved fuel container',
				'Fire extinguisher',
				'Eye protection',
				'Shop towels',
				'Scan tool'
			],
			cautions: [
				'Fuel vapour ignites easily: no sparks, flames or smoking.',
				'Relieve pressure before opening any fuel fitting.',
				'Direct-injection high-pressure lines hold far higher pressure: never open them except as the procedure directs.',
				'Wipe up spills at once and store fuel-soaked rags in a closed metal bin.'
			],
			serviceInfo: ['specifications', 'diagnostic procedure', 'repair procedure'],
			questions: [
				{
					prompt: 'Why is fuel pressure relieved before the gauge is connected?',
					options: [
						{
							text: 'Fuel sprays out under pressure and can catch fire or hit your eyes',
							correct: true
						},
						{ text: 'The gauge cannot read pressure that is already present', correct: false },
						{ text: 'It resets the fuel pump module', correct: false }
					],
					explanation:
						'An atomised fuel spray is far easier to ignite than liquid fuel and can reach hot exhaust parts.'
				},
				{
					prompt: 'Pressure drops quickly to zero after switch-off. What could cause this?',
					options: [
						{
							text: 'A leaking injector, pump check valve or pressure regulator',
							correct: true
						},
						{ text: 'A clogged fuel filter', correct: false },
						{ text: 'A weak ignition coil', correct: false },
						{ text: 'Normal behaviour for a returnless system', correct: false }
					],
					explanation:
						'The system should hold pressure, so a fast drop means fuel is escaping through something that should seal.'
				},
				{
					prompt:
						'Pressure is correct at idle but falls when the engine is loaded. What does this suggest?',
					options: [
						{
							text: 'A weak pump or restricted filter that cannot keep up with demand',
							correct: true
						},
						{ text: 'A leaking injector', correct: false },
						{ text: 'Pressure regulator stuck closed', correct: false }
					],
					explanation:
						'Idle needs little fuel, while load shows whether the pump can deliver enough flow.'
				},
				{
					prompt: 'Why measure volume as well as pressure?',
					options: [
						{ text: 'Pressure gauges are often inaccurate', correct: false },
						{
							text: 'A pump can make correct pressure with little flow but still starve the engine',
							correct: true
						},
						{ text: 'Volume is easier to read than pressure', correct: false }
					],
					explanation:
						'Pressure shows the pump can push against the regulator, but volume shows whether it can supply what the engine burns.'
				},
				{
					prompt:
						'On a return-type system with a vacuum-referenced regulator, what happens when the regulator vacuum hose is removed at idle?',
					options: [
						{ text: 'Fuel pressure falls', correct: false },
						{ text: 'Fuel pressure stays the same', correct: false },
						{ text: 'Fuel pressure rises', correct: true }
					],
					explanation:
						'Manifold vacuum normally lowers regulated pressure at idle, so removing it brings pressure up.'
				},
				{
					prompt: 'Which precautions are needed before opening a fuel fitting? Choose two.',
					options: [
						{ text: 'Run the engine to warm the fuel first', correct: false },
						{ text: 'Hang an incandescent drop light close to the fitting', correct: false },
						{ text: 'Relieve system pressure', correct: true },
						{ text: 'Have a fire extinguisher within reach', correct: true }
					],
					explanation:
						'Releasing pressure prevents spray, and the extinguisher is there in case fuel does ignite.'
				}
			]
		},
		{
			code: 'EPF-04',
			title: 'Diagnose ignition coils and spark plugs',
			description:
				'Test coil-on-plug ignition, inspect and read spark plugs, and replace them gapped and torqued correctly without damaging the cylinder head threads.',
			tier: 1,
			requiredLevel: 4,
			minHours: 3,
			checklist: [
				{ text: 'Reads misfire codes and counters to find the affected cylinders' },
				{ text: 'Swaps the suspect coil to another cylinder to see whether the misfire follows' },
				{ text: 'Inspects boots for carbon tracking and measures coil resistance' },
				{
					text: 'Checks spark with an adjustable spark tester, never by holding a lead near ground',
					safety: true
				},
				{
					text: 'Lets an aluminium head cool and blows debris from the plug wells before removing plugs',
					safety: true
				},
				{ text: 'Reads the old plugs for wear, fouling and overheating' },
				{ text: 'Checks new plug gaps without prying on fine-wire centre electrodes' },
				{
					text: 'Starts plugs by hand and tightens them to the specified torque',
					safety: true
				},
				{
					text: 'Refits coils, clears codes and confirms no misfire',
					safety: true
				}
			],
			specs: [
				{ label: 'Spark plug torque, gasket seat', value: 18, unit: 'lbf·ft', limit: 'nominal' },
				{ label: 'Spark plug gap', value: 1.1, unit: 'mm', limit: 'nominal' },
				{ label: 'Coil primary resistance', value: 0.7, unit: 'Ω', limit: 'nominal' },
				{ label: 'Coil secondary resistance', value: 8000, unit: 'Ω', limit: 'nominal' }
			],
			tools: [
				'Scan tool',
				'Adjustable spark tester',
				'Digital multimeter',
				'Spark plug socket and extensions',
				'Torque wrench',
				'Gap gauge',
				'Compressed air and eye protection'
			],
			cautions: [
				'Secondary ignition voltage can give a severe shock: use insulated tools and a spark tester.',
				'Remove plugs only from a cool aluminium head to avoid stripping the threads.',
				'Prolonged misfire overheats the catalytic converter.'
			],
			serviceInfo: ['specifications', 'diagnostic procedure', 'repair procedure'],
			questions: [
				{
					prompt: 'Why swap a suspect coil with one from another cylinder?',
					options: [
						{ text: 'Coils wear evenly if rotated', correct: false },
						{ text: 'To reset the misfire counters', correct: false },
						{ text: 'If the misfire moves with the coil, the coil is at fault', correct: true }
					],
					explanation:
						'Moving the part and watching whether the fault follows it proves the cause without buying parts.'
				},
				{
					prompt: 'Why are spark plugs tightened to a specified torque?',
					options: [
						{
							text: 'Too loose and they overheat or leak; too tight and they stretch or strip the threads',
							correct: true
						},
						{ text: 'Torque sets the plug gap', correct: false },
						{ text: 'Any firm tightness is fine because the gasket compensates', correct: false }
					],
					explanation:
						'The plug sheds heat through its seat and threads, so correct clamping controls both heat transfer and thread damage.'
				},
				{
					prompt: 'Why blow out the plug wells before removing the plugs?',
					options: [
						{ text: 'To cool the coil', correct: false },
						{ text: 'To dry the threads for a torque reading', correct: false },
						{ text: 'So dirt cannot fall into the cylinder', correct: true }
					],
					explanation:
						'Grit dropping into the cylinder can score the bore or damage valves when the engine runs.'
				},
				{
					prompt: 'A plug has dry, black, sooty deposits. What does that indicate?',
					options: [
						{ text: 'Normal wear', correct: false },
						{ text: 'Engine overheating', correct: false },
						{ text: 'Coolant entering the cylinder', correct: false },
						{ text: 'A rich mixture or a weak spark', correct: true }
					],
					explanation:
						'Carbon soot forms when fuel is not burned completely, from too much fuel or too little spark energy.'
				},
				{
					prompt: 'Why use an adjustable spark tester instead of holding a lead near ground?',
					options: [
						{ text: 'It makes the spark easier to see in daylight only', correct: false },
						{
							text: 'It limits the voltage safely; an open gap can make the coil arc through its insulation or shock you',
							correct: true
						},
						{ text: 'It is only needed on distributor ignition', correct: false }
					],
					explanation:
						'With no controlled path, secondary voltage climbs until it jumps somewhere, which can damage the coil or pass through you.'
				},
				{
					prompt: 'A coil boot shows a carbon track on the inside. What should be done?',
					options: [
						{
							text: 'Replace the boot or coil, because spark can leak to ground along the track',
							correct: true
						},
						{ text: 'Clean it with a rag and refit it', correct: false },
						{ text: 'Ignore it; tracking does not affect the spark', correct: false }
					],
					explanation:
						'A carbon track is a conductive path that steals the spark, especially under load when more voltage is needed.'
				}
			]
		},
		{
			code: 'EPF-05',
			title: 'Diagnose an engine misfire',
			description:
				'Find whether a misfire comes from ignition, fuel or mechanical causes, on one cylinder or many, and confirm the repair under the conditions where it happened.',
			tier: 1,
			requiredLevel: 3,
			minHours: 4,
			checklist: [
				{ text: 'Verifies the misfire and notes when it happens: cold or hot, idle or load' },
				{ text: 'Reads codes, per-cylinder misfire counters and freeze frame' },
				{ text: 'Checks fuel trim for a lean or rich condition' },
				{ text: 'Decides whether the misfire is one cylinder or random' },
				{ text: 'Tests ignition for the affected cylinder by swapping coil and plug' },
				{ text: 'Tests the injector by swapping, resistance or a pulse check' },
				{
					text: 'Disables fuel and ignition before a compression or leak-down test',
					safety: true
				},
				{ text: 'Runs compression and, if low, a leak-down test to find where it escapes' },
				{
					text: 'Repairs the cause and confirms zero misfire counts under the original conditions',
					safety: true
				}
			],
			specs: [
				{ label: 'Cranking compression', value: 140, unit: 'psi', limit: 'minimum' },
				{
					label: 'Compression variation between cylinders',
					value: 10,
					unit: '%',
					limit: 'maximum'
				},
				{ label: 'Injector resistance', value: 12, unit: 'Ω', limit: 'nominal' },
				{ label: 'Warm idle speed', value: 750, unit: 'rpm', limit: 'nominal' }
			],
			tools: [
				'Scan tool with misfire counters',
				'Compression gauge',
				'Leak-down tester',
				'Injector pulse light',
				'Digital multimeter',
				'Adjustable spark tester'
			],
			cautions: [
				'A flashing check-engine lamp means catalyst-damaging misfire: limit driving.',
				'Disable fuel and ignition before compression testing.',
				'Keep clear of the fan and belts with the engine running.'
			],
			serviceInfo: ['diagnostic procedure', 'specifications', 'service bulletin'],
			questions: [
				{
					prompt: 'The check-engine lamp is flashing. What does it warn of?',
					options: [
						{ text: 'Low engine oil pressure', correct: false },
						{
							text: 'A misfire severe enough to damage the catalytic converter',
							correct: true
						},
						{ text: 'An evaporative system leak', correct: false },
						{ text: 'A service interval reminder', correct: false }
					],
					explanation:
						'Unburned fuel from the misfire burns in the converter and can overheat it, so driving should be limited.'
				},
				{
					prompt:
						'A cylinder 3 misfire stays on cylinder 3 after the coil and plug are swapped with cylinder 2. What next?',
					options: [
						{ text: 'Replace the cylinder 3 coil anyway', correct: false },
						{ text: 'Replace the engine control module', correct: false },
						{ text: 'Test the cylinder 3 injector, then compression', correct: true }
					],
					explanation:
						'Ignition is proven good because the fault did not move, which leaves fuel delivery and mechanical causes.'
				},
				{
					prompt:
						'Random misfires on all cylinders with high positive fuel trim point to which kind of problem?',
					options: [
						{ text: 'A single burnt valve', correct: false },
						{ text: 'A lean condition such as a vacuum leak or low fuel pressure', correct: true },
						{ text: 'One faulty coil', correct: false }
					],
					explanation:
						'A common cause affecting every cylinder, with the module adding fuel, means the mixture is lean across the engine.'
				},
				{
					prompt:
						'Compression reads 150, 148, 152 and 95 psi on cylinders 1 to 4. What is the right next step?',
					options: [
						{ text: 'Accept it; the average is within specification', correct: false },
						{ text: 'Replace cylinder 4 spark plug', correct: false },
						{ text: 'Retest all cylinders with the throttle closed', correct: false },
						{ text: 'Leak-down test cylinder 4 to find where pressure escapes', correct: true }
					],
					explanation:
						'Cylinder 4 is far below the others, and leak-down shows whether the loss is through the valves, rings or head gasket.'
				},
				{
					prompt: 'Why disable fuel and ignition before a compression test?',
					options: [
						{
							text: 'So the engine cannot start and fuel is not sprayed into open cylinders',
							correct: true
						},
						{ text: 'To raise the compression reading', correct: false },
						{ text: 'To let the starter crank faster', correct: false }
					],
					explanation:
						'With plugs out, fuel washes the cylinders and sprays from the holes, and live coils can spark and ignite it.'
				},
				{
					prompt: 'How do you confirm a misfire repair? Choose two.',
					options: [
						{ text: 'Clear the codes and release the vehicle straight away', correct: false },
						{ text: 'Check that the engine idles for one minute', correct: false },
						{ text: 'Watch the misfire counters stay at zero', correct: true },
						{
							text: 'Drive under the same load and temperature that caused the fault',
							correct: true
						}
					],
					explanation:
						'Misfires often appear only under particular conditions, so the repair is proven by recreating them and seeing no counts.'
				}
			]
		},
		{
			code: 'EPF-06',
			title: 'Test airflow and oxygen sensors',
			description:
				'Check that the mass airflow sensor reads the air entering the engine and that the oxygen sensors respond correctly, before blaming either for a fuel control fault.',
			tier: 2,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{
					text: 'Inspects the air filter and the duct between the airflow sensor and throttle for leaks'
				},
				{
					text: 'Reads airflow sensor data at idle and on a snap and compares with expected values'
				},
				{ text: 'Checks the airflow sensor power, ground and signal circuits' },
				{ text: 'Checks the upstream oxygen sensor switches between rich and lean quickly' },
				{ text: 'Measures the oxygen sensor heater resistance and checks its circuit' },
				{ text: 'Checks the downstream sensor is steadier than the upstream sensor' },
				{
					text: 'Lets the exhaust cool before removing a sensor',
					safety: true
				},
				{ text: 'Repairs and confirms fuel trim and sensor data return to normal' }
			],
			specs: [
				{ label: 'Upstream oxygen sensor, rich reading', value: 0.8, unit: 'V', limit: 'minimum' },
				{ label: 'Upstream oxygen sensor, lean reading', value: 0.2, unit: 'V', limit: 'maximum' },
				{ label: 'Lean-to-rich response time', value: 100, unit: 'ms', limit: 'maximum' },
				{ label: 'Oxygen sensor heater resistance', value: 5, unit: 'Ω', limit: 'nominal' },
				{
					label: 'Analogue airflow sensor signal, warm idle',
					value: 1.0,
					unit: 'V',
					limit: 'nominal'
				}
			],
			tools: [
				'Scan tool with graphing',
				'Digital multimeter',
				'Lab scope',
				'Oxygen sensor socket',
				'Airflow sensor cleaner'
			],
			cautions: [
				'Exhaust parts and sensors get hot enough to burn: let them cool.',
				'Use only sensor-safe cleaner; other solvents and silicone sealers ruin sensors.'
			],
			serviceInfo: ['diagnostic procedure', 'specifications', 'wiring diagram'],
			questions: [
				{
					prompt:
						'The upstream sensor reads a steady 0.1 V and fuel trim is climbing. You add a small amount of enrichment and the sensor rises to 0.9 V. What does this show?',
					options: [
						{ text: 'The sensor works and the engine really is running lean', correct: true },
						{ text: 'The sensor is faulty and must be replaced', correct: false },
						{ text: 'The sensor heater has failed', correct: false }
					],
					explanation:
						'A sensor that responds to extra fuel is reporting truthfully, so the lean cause must be found elsewhere.'
				},
				{
					prompt:
						'The downstream sensor switches as fast as the upstream sensor. What does that suggest?',
					options: [
						{ text: 'The engine is running rich', correct: false },
						{ text: 'The catalytic converter is storing little oxygen', correct: true },
						{ text: 'Both sensors are faulty', correct: false }
					],
					explanation:
						'A working converter smooths out the oxygen swings, so a downstream copy of the upstream signal points to a weak converter.'
				},
				{
					prompt: 'A contaminated airflow sensor that reads too little air usually shows what?',
					options: [
						{ text: 'Positive fuel trim that grows with airflow', correct: true },
						{ text: 'Negative fuel trim at idle only', correct: false },
						{ text: 'No change in fuel trim', correct: false }
					],
					explanation:
						'The module fuels for less air than is really entering, so the oxygen sensor sees lean and trim adds fuel, most at high airflow.'
				}
			]
		},
		{
			code: 'EPF-07',
			title: 'Perform an evaporative emission system smoke test',
			description:
				'Seal the fuel vapour system and introduce low-pressure smoke to find where vapour escapes, then repair and confirm the system holds.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{ text: 'Reads evaporative system codes and confirms fuel level is within the test range' },
				{ text: 'Inspects the filler cap seal and the filler neck' },
				{ text: 'Closes the vent valve with the scan tool or as the procedure directs' },
				{
					text: 'Connects the smoke machine to the service port, using inert gas where the machine requires it',
					safety: true
				},
				{
					text: 'Introduces smoke without exceeding the test pressure and watches the flow gauge settle',
					safety: true
				},
				{ text: 'Searches for smoke with a bright light along lines, valves and the tank' },
				{ text: 'Repairs, retests, restores the vent valve and runs the system self-test' }
			],
			specs: [{ label: 'Smoke test pressure', value: 0.5, unit: 'psi', limit: 'maximum' }],
			tools: ['Smoke machine', 'Scan tool', 'Bright inspection light', 'Service port adapters'],
			cautions: [
				'Fuel vapour is flammable: no sparks or flames nearby.',
				'Exceeding the test pressure can damage the tank and valves.'
			],
			serviceInfo: ['diagnostic procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why is the vent valve closed before a smoke test?',
					options: [
						{ text: 'To switch off the fuel pump', correct: false },
						{
							text: 'Otherwise smoke escapes through the vent and the system never seals',
							correct: true
						},
						{ text: 'To stop fuel from entering the smoke machine', correct: false }
					],
					explanation:
						'The vent is a normal opening, so it must be closed for any other leak to show.'
				},
				{
					prompt: 'Why is the smoke introduced at very low pressure?',
					options: [
						{ text: 'High pressure makes the smoke invisible', correct: false },
						{ text: 'The law limits smoke pressure', correct: false },
						{
							text: 'The system is designed for small pressures and can be damaged',
							correct: true
						}
					],
					explanation:
						'Tank and valve seals are not built for shop air pressure, and too much can damage them and create a new leak.'
				},
				{
					prompt: 'Why do some smoke machines use an inert gas supply for fuel systems?',
					options: [
						{ text: 'Shop air is always too wet', correct: false },
						{ text: 'To avoid mixing air with fuel vapour inside the tank', correct: true },
						{ text: 'Inert gas makes thicker smoke', correct: false }
					],
					explanation:
						'Adding oxygen-rich air to fuel vapour can form a flammable mix, and inert gas removes that risk.'
				}
			]
		},
		{
			code: 'EPF-08',
			title: 'Diagnose a vacuum leak',
			description:
				'Confirm a vacuum leak from fuel trim and manifold pressure, find it safely with smoke, repair it and confirm trim and idle return to normal.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{ text: 'Compares fuel trim at idle with trim at about 2500 rpm' },
				{ text: 'Reads manifold pressure at warm idle' },
				{
					text: 'Listens for hissing and inspects hoses, breather system, brake booster hose and intake seals'
				},
				{
					text: 'Finds the leak with smoke rather than spraying flammable cleaner near hot parts',
					safety: true
				},
				{ text: 'Repairs the leak with the correct hose, seal or gasket' },
				{ text: 'Resets learned fuel trim if the procedure calls for it' },
				{ text: 'Confirms fuel trim and idle speed are back within specification' }
			],
			specs: [
				{
					label: 'Manifold absolute pressure, warm idle',
					value: 35,
					unit: 'kPa',
					limit: 'maximum'
				},
				{ label: 'Warm idle speed', value: 750, unit: 'rpm', limit: 'nominal' },
				{
					label: 'Long-term fuel trim after repair, either direction',
					value: 10,
					unit: '%',
					limit: 'maximum'
				}
			],
			tools: ['Scan tool', 'Smoke machine', 'Vacuum gauge', 'Stethoscope'],
			cautions: [
				'Do not spray flammable cleaner near hot exhaust or ignition parts.',
				'Keep clear of the fan and belts with the engine running.'
			],
			serviceInfo: ['diagnostic procedure', 'specifications'],
			questions: [
				{
					prompt:
						'On an engine with an airflow sensor, why does a vacuum leak make fuel trim go positive?',
					options: [
						{ text: 'The leak adds fuel vapour to the intake', correct: false },
						{ text: 'It raises fuel pressure', correct: false },
						{ text: 'Air enters without being measured, so the mixture runs lean', correct: true }
					],
					explanation:
						'The module fuels only for the air it measured, and the extra unmetered air leans the mixture.'
				},
				{
					prompt: 'Why is smoke preferred to spraying cleaner to find a vacuum leak?',
					options: [
						{ text: 'It has no fire risk and shows the exact leak point', correct: true },
						{ text: 'Smoke tests can be done with the engine running at speed', correct: false },
						{ text: 'Cleaner cannot enter a vacuum leak', correct: false }
					],
					explanation:
						'Flammable spray near hot parts can ignite, while smoke escaping from the leak is visible and safe.'
				},
				{
					prompt:
						'At warm idle, manifold absolute pressure reads 55 kPa instead of about 30 kPa. What could it mean?',
					options: [
						{ text: 'Normal reading at idle', correct: false },
						{ text: 'A rich fuel mixture', correct: false },
						{
							text: 'Low manifold vacuum from a large leak or a mechanical fault such as retarded valve timing',
							correct: true
						}
					],
					explanation:
						'Higher absolute pressure means less vacuum, which points to air getting in or an engine that cannot pull normal vacuum.'
				}
			]
		},
		{
			code: 'EPF-09',
			title: 'Clean an electronic throttle body and perform an idle relearn',
			description:
				'Remove carbon from an electronic throttle body without damaging it, then run the relearn so the engine control module idles the engine correctly.',
			tier: 2,
			requiredLevel: 4,
			minHours: 1.5,
			checklist: [
				{
					text: 'Switches the ignition off and keeps the key away before touching the throttle',
					safety: true
				},
				{ text: 'Removes the intake duct and inspects the bore and plate for carbon' },
				{
					text: 'Applies cleaner to a cloth, keeping it out of the airflow sensor and throttle motor',
					safety: true
				},
				{
					text: 'Does not force the throttle plate by hand unless the procedure allows it',
					safety: true
				},
				{ text: 'Refits the duct and tightens clamps so no unmetered air enters' },
				{ text: 'Performs the idle or throttle relearn with the scan tool' },
				{ text: 'Confirms idle speed is in specification and no codes have set' }
			],
			specs: [
				{ label: 'Warm idle speed', value: 750, unit: 'rpm', limit: 'nominal' },
				{ label: 'Throttle body mounting bolt torque', value: 10, unit: 'N·m', limit: 'nominal' }
			],
			tools: [
				'Throttle body cleaner',
				'Lint-free cloths',
				'Scan tool',
				'Torque wrench',
				'Eye protection and gloves'
			],
			cautions: [
				'An electronic throttle plate can snap shut without warning with the ignition on: keep fingers out.',
				'Cleaner is flammable and harmful: ventilate and wear eye protection.',
				'Never spray cleaner into the airflow sensor.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why is a relearn needed after cleaning a throttle body?',
					options: [
						{
							text: 'The module learned to open the throttle further for the carbon, so idle may run high',
							correct: true
						},
						{ text: 'Cleaning erases the module software', correct: false },
						{ text: 'The throttle motor must be broken in', correct: false }
					],
					explanation:
						'The learned position compensated for restricted airflow, and with the carbon gone that extra opening lets in too much air.'
				},
				{
					prompt: 'Why is the ignition switched off before reaching into the throttle body?',
					options: [
						{ text: 'It stops the fuel pump priming', correct: false },
						{ text: 'The plate can move suddenly and trap fingers', correct: true },
						{ text: 'The cleaner only works with the power off', correct: false }
					],
					explanation:
						'With power on, the module may move the throttle motor at any time, such as during a self-check.'
				}
			]
		},
		{
			code: 'EPF-10',
			title: 'Diagnose an exhaust gas recirculation system',
			description:
				'Find why recirculation flow is too low or too high, testing the valve, its position sensor and control circuit, and the passages it flows through.',
			tier: 3,
			requiredLevel: 2,
			minHours: 3,
			checklist: [
				{ text: 'Reads codes and freeze frame to see whether flow was too low or too high' },
				{
					text: 'Warms the engine and compares commanded and actual valve position on the scan tool'
				},
				{
					text: 'Commands the valve open at idle, keeping clear of moving parts, and watches for an rpm drop',
					safety: true
				},
				{ text: 'Checks the position sensor reference, signal and ground circuits' },
				{
					text: 'Lets the valve and pipes cool before removing them',
					safety: true
				},
				{ text: 'Inspects the valve and passages for carbon and cleans or replaces parts' },
				{
					text: 'Fits a new gasket and torques the fasteners, then confirms the system test passes',
					safety: true
				}
			],
			specs: [
				{ label: 'Position sensor reference voltage', value: 5, unit: 'V', limit: 'nominal' },
				{
					label: 'Idle speed drop with valve commanded open',
					value: 100,
					unit: 'rpm',
					limit: 'minimum'
				}
			],
			tools: ['Scan tool', 'Digital multimeter', 'Carbon scraper', 'Torque wrench', 'Gloves'],
			cautions: [
				'Recirculation valves and pipes get very hot: let them cool before handling.',
				'Keep clear of the fan and belts while commanding the valve with the engine running.'
			],
			serviceInfo: ['diagnostic procedure', 'wiring diagram', 'specifications'],
			questions: [
				{
					prompt: 'What symptom does a recirculation valve stuck open usually cause?',
					options: [
						{ text: 'Rough idle or stalling', correct: true },
						{ text: 'Spark knock under hard acceleration only', correct: false },
						{ text: 'High idle speed', correct: false }
					],
					explanation:
						'At idle the engine cannot tolerate exhaust gas diluting the charge, so it runs rough or stalls.'
				},
				{
					prompt:
						'The valve is commanded open at idle, the position sensor shows it moving, but rpm does not change. What is likely?',
					options: [
						{ text: 'The valve is stuck closed', correct: false },
						{ text: 'The recirculation passages are blocked with carbon', correct: true },
						{ text: 'The position sensor is faulty', correct: false }
					],
					explanation:
						'The valve opens, but if no exhaust gas reaches the intake there is no effect on the engine.'
				}
			]
		},
		{
			code: 'EPF-11',
			title: 'Check emissions readiness monitors and complete a drive cycle',
			description:
				'Read readiness monitor status, meet the enabling conditions and drive so the monitors run, so the vehicle is ready for inspection and the repair is proven.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{ text: 'Reads monitor status since codes were cleared and for this drive cycle' },
				{ text: 'Confirms there are no current or pending codes that would stop monitors running' },
				{
					text: 'Checks the enabling conditions such as fuel level, cold-start temperature and ambient'
				},
				{
					text: 'Drives the cycle within traffic law, with a helper watching the scan tool',
					safety: true
				},
				{ text: 'Rechecks the monitors and confirms they show complete' },
				{ text: 'Records the result for the customer and the inspection' }
			],
			specs: [
				{ label: 'Fuel level for the evaporative monitor', value: 15, unit: '%', limit: 'minimum' },
				{ label: 'Fuel level for the evaporative monitor', value: 85, unit: '%', limit: 'maximum' },
				{ label: 'Coolant temperature for a cold start', value: 50, unit: '°C', limit: 'maximum' }
			],
			tools: ['Scan tool', 'Service information system'],
			cautions: [
				'Obey traffic law; drive cycles never justify unsafe driving.',
				'The driver never operates the scan tool while moving.'
			],
			serviceInfo: ['diagnostic procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why do monitors show incomplete after codes are cleared?',
					options: [
						{ text: 'The monitors failed', correct: false },
						{ text: 'The scan tool was disconnected too early', correct: false },
						{ text: 'Clearing codes also resets monitor status', correct: true }
					],
					explanation:
						'Each monitor must run again under its own conditions before it reports complete.'
				},
				{
					prompt:
						'Everything is complete except the evaporative monitor, and the tank is almost full. What is the likely reason?',
					options: [
						{ text: 'The catalytic converter has failed', correct: false },
						{ text: 'Fuel level is outside the range the monitor needs', correct: true },
						{ text: 'The evaporative system has a large leak', correct: false }
					],
					explanation:
						'Many evaporative tests only run within a fuel level window, so a full or near-empty tank keeps them waiting.'
				},
				{
					prompt:
						'Why can a vehicle fail inspection with incomplete monitors even with no lamp on?',
					options: [
						{ text: 'Incomplete monitors always mean a hidden fault code', correct: false },
						{ text: 'Inspection stations cannot read monitor status', correct: false },
						{ text: 'It has not yet shown its emission systems work', correct: true }
					],
					explanation:
						'Readiness shows the self-tests have run, and without them there is no proof the systems passed.'
				}
			]
		},
		{
			code: 'EPF-12',
			title: 'Road-test a vehicle for a drivability complaint',
			description:
				'Plan and carry out a safe road test that reproduces the customer complaint and captures the data needed to diagnose it, then repeat it to confirm the repair.',
			tier: 1,
			requiredLevel: 4,
			minHours: 3,
			checklist: [
				{ text: 'Asks the customer when, how often and under what conditions the problem happens' },
				{
					text: 'Checks tyres, brakes, fluid leaks and lights before driving',
					safety: true
				},
				{
					text: 'Connects the scan tool, secures the cable away from the pedals and sets up data recording',
					safety: true
				},
				{
					text: 'Drives under the described conditions within traffic law, with a helper watching the data',
					safety: true
				},
				{
					text: 'Captures data when the symptom happens and notes speed, gear, load and temperature'
				},
				{ text: 'Reviews the recording after the drive and chooses the next test' },
				{
					text: 'Repeats the road test after the repair under the same conditions to confirm the fix',
					safety: true
				}
			],
			specs: [
				{ label: 'Coolant temperature at full warm-up', value: 90, unit: '°C', limit: 'nominal' }
			],
			tools: ['Scan tool with data recording', 'Notepad or voice recorder'],
			cautions: [
				'Obey traffic law at all times during a road test.',
				'Never operate the scan tool while driving.',
				'Check the brakes before driving a vehicle in for repair.',
				'Secure cables and loose items so they cannot jam the pedals.'
			],
			serviceInfo: ['diagnostic procedure', 'service bulletin', 'owner information'],
			questions: [
				{
					prompt: 'Why interview the customer before the road test?',
					options: [
						{ text: 'To know the exact conditions needed to reproduce the problem', correct: true },
						{ text: 'To agree a price before diagnosing', correct: false },
						{ text: 'It is a courtesy only and does not affect the test', correct: false }
					],
					explanation:
						'Many drivability faults only appear at a particular temperature, speed or load, so the customer tells you what to recreate.'
				},
				{
					prompt: 'Why does a helper watch the scan tool during the road test?',
					options: [
						{ text: 'The scan tool needs two people to record', correct: false },
						{ text: 'It halves the length of the road test', correct: false },
						{ text: 'The driver must keep full attention on the road', correct: true }
					],
					explanation:
						'Looking at a screen while driving is dangerous and unlawful, so data is watched by a passenger or recorded.'
				},
				{
					prompt:
						'The customer says the engine hesitates only in the first few minutes on cold mornings. How do you plan the test?',
					options: [
						{
							text: 'Start the test from a cold soak, with data recording from start-up',
							correct: true
						},
						{ text: 'Warm the engine fully first so readings are stable', correct: false },
						{ text: 'Test in the afternoon after other vehicles have been moved', correct: false }
					],
					explanation:
						'The fault is tied to a cold engine, so the test must begin before the engine warms or the symptom will not appear.'
				},
				{
					prompt: 'Why check brakes, tyres and lights before the road test?',
					options: [
						{ text: 'It resets the readiness monitors', correct: false },
						{ text: 'A vehicle in for repair may not be safe to drive', correct: true },
						{ text: 'The customer is billed for the inspection', correct: false }
					],
					explanation:
						'You are responsible for the vehicle on the road, and an unknown defect can cause a crash.'
				},
				{
					prompt:
						'For a hesitation on acceleration, which data items are most useful to record? Choose two.',
					options: [
						{ text: 'Throttle position and engine speed', correct: true },
						{ text: 'Fuel trim and oxygen sensor readings', correct: true },
						{ text: 'Door ajar switch status', correct: false },
						{ text: 'Outside mirror position', correct: false }
					],
					explanation:
						'Throttle, speed and mixture data show what the driver asked for and whether the engine got the fuel and air it needed.'
				},
				{
					prompt: 'The symptom does not happen during the road test. What is the best approach?',
					options: [
						{ text: 'Tell the customer nothing is wrong and close the job', correct: false },
						{
							text: 'Gather more detail and try to recreate the conditions, or use a data logger on later drives',
							correct: true
						},
						{ text: 'Replace the part most often linked to the complaint', correct: false }
					],
					explanation:
						'Without seeing the fault, any repair is a guess, so more information or longer recording is needed.'
				}
			]
		}
	]
};
