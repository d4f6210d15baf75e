import type { AreaDef } from '../../../framework/types';

export const area: AreaDef = {
	code: 'ATX',
	name: 'Automatic transmission and transaxle',
	tasks: [
		{
			code: 'ATX-01',
			title: 'Check automatic transmission fluid level and condition by the temperature procedure',
			description:
				'Check the fluid level at the temperature the procedure calls for, using the dipstick or the check plug, and judge the fluid condition. A level read at the wrong temperature is not a valid reading.',
			tier: 1,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{
					text: 'Look up the fluid type and the check method (dipstick or check plug) for the unit'
				},
				{
					text: 'Park on level ground, apply the parking brake and chock the wheels',
					safety: true
				},
				{ text: 'Bring the fluid to the specified check temperature, confirmed on the scan tool' },
				{ text: 'With the engine idling, move the selector through each range and back to Park' },
				{
					text: 'For a check-plug unit, raise the vehicle level on the hoist with the engine running and people clear',
					safety: true
				},
				{ text: 'Read the level at the correct temperature and note colour, smell and debris' },
				{ text: 'Add the specified fluid in small amounts if low and recheck' },
				{
					text: 'Refit the check plug with a new seal and torque it to specification',
					safety: true
				},
				{ text: 'Record the level, temperature and fluid condition on the repair order' }
			],
			specs: [
				{
					label: 'Fluid temperature for check, lower limit',
					value: 35,
					unit: '°C',
					limit: 'minimum'
				},
				{
					label: 'Fluid temperature for check, upper limit',
					value: 45,
					unit: '°C',
					limit: 'maximum'
				},
				{ label: 'Check plug torque', value: 40, unit: 'N·m', limit: 'nominal' }
			],
			tools: [
				'Scan tool with transmission data',
				'Wheel chocks',
				'Lint-free rags',
				'Fluid pump or funnel with fill tube',
				'Torque wrench'
			],
			cautions: [
				'Transmission fluid at running temperature can burn skin.',
				'Keep hands, hair and clothing clear of the fan and drive belts while the engine runs.',
				'With the engine running on a hoist, set the parking brake and keep others out of the bay.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'maintenance schedule'],
			questions: [
				{
					prompt: 'Why must the fluid be at the specified temperature when the level is checked?',
					options: [
						{
							text: 'Fluid expands as it warms, so the level reading depends on temperature',
							correct: true
						},
						{ text: 'Cold fluid cannot be seen on the dipstick', correct: false },
						{ text: 'The transmission locks the check plug when cold', correct: false },
						{ text: 'It only matters for the colour check', correct: false }
					],
					explanation:
						'A level read too cold looks low and invites overfilling; read too hot it looks high and hides a low level.'
				},
				{
					prompt:
						'On a check-plug unit at 40 °C with the engine idling, a thin stream trickles from the hole and then slows to drips. What does this show?',
					options: [
						{ text: 'The unit is overfilled', correct: false },
						{ text: 'The check is invalid because the engine is running', correct: false },
						{ text: 'The level is correct', correct: true },
						{ text: 'The unit is low and needs fluid until it pours', correct: false }
					],
					explanation:
						'At the check temperature the correct level is the bottom of the check hole, so a small trickle that slows to a drip means full.'
				},
				{
					prompt: 'What can happen if an automatic transmission is overfilled?',
					options: [
						{ text: 'The torque converter locks up permanently', correct: false },
						{
							text: 'Rotating parts whip the fluid into foam, causing slipping and fluid pushed out of the vent',
							correct: true
						},
						{ text: 'Nothing, extra fluid just improves cooling', correct: false }
					],
					explanation: 'Aerated fluid does not hold pressure, so clutches slip and overheat.'
				},
				{
					prompt: 'Why move the selector through every range before reading the level?',
					options: [
						{ text: 'It clears stored trouble codes', correct: false },
						{
							text: 'It fills the clutch, servo and valve body circuits so the level reflects operating conditions',
							correct: true
						},
						{ text: 'It warms the fluid faster', correct: false }
					],
					explanation:
						'Empty circuits fill from the sump when applied, so reading before cycling the ranges gives a false high level.'
				},
				{
					prompt:
						'The fluid on the dipstick is dark brown and smells burnt. What is the best next step?',
					options: [
						{ text: 'Ignore it, colour does not matter', correct: false },
						{
							text: 'Record it and tell the supervisor; the unit needs diagnosis before any fluid exchange',
							correct: true
						},
						{ text: 'Top it up and return the vehicle', correct: false },
						{ text: 'Add a friction additive', correct: false }
					],
					explanation:
						'Burnt fluid points to overheated friction material, which is a symptom that needs diagnosis, not just a top-up.'
				}
			]
		},
		{
			code: 'ATX-02',
			title: 'Service automatic transmission fluid and filter',
			description:
				'Drain the fluid, drop and clean the pan, replace the filter and gasket, and refill to the correct level by the temperature procedure.',
			tier: 1,
			requiredLevel: 4,
			minHours: 4,
			checklist: [
				{
					text: 'Confirm the fluid type, refill quantity and pan bolt torque in service information'
				},
				{ text: 'Raise the vehicle level on the hoist and support it', safety: true },
				{ text: 'Drain the fluid and note its condition' },
				{ text: 'Remove the pan and inspect the magnet and pan deposits' },
				{
					text: 'Fit the new filter, making sure the old filter seal is not left in the bore',
					safety: true
				},
				{ text: 'Clean the pan and magnet and fit a new gasket' },
				{ text: 'Tighten pan bolts in a crisscross pattern to specification', safety: true },
				{ text: 'Refill with the specified fluid, starting with the quantity drained' },
				{ text: 'Run the engine, cycle the ranges and set the level at the check temperature' },
				{ text: 'Check for leaks and road test', safety: true }
			],
			specs: [
				{ label: 'Drain and refill quantity', value: 3.8, unit: 'L', limit: 'nominal' },
				{ label: 'Pan bolt torque', value: 11, unit: 'N·m', limit: 'nominal' },
				{ label: 'Drain plug torque', value: 35, unit: 'N·m', limit: 'nominal' }
			],
			tools: [
				'Drain pan',
				'Inch-pound or small-range torque wrench',
				'Plastic gasket scraper',
				'Fluid pump or funnel',
				'Scan tool'
			],
			cautions: [
				'Fluid may be hot; let it cool or wear gloves.',
				'The pan still holds fluid when the last bolts are loosened; support it and lower it level.',
				'Clean up spills at once; fluid on the floor causes slips.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'maintenance schedule'],
			questions: [
				{
					prompt: 'Why are the pan bolts tightened in a crisscross pattern to a low torque?',
					options: [
						{ text: 'To allow the pan to expand', correct: false },
						{ text: 'Because the bolts are designed to stretch', correct: false },
						{ text: 'To avoid bending the pan flange and crushing the gasket', correct: true }
					],
					explanation:
						'A thin pressed pan distorts easily, and over-tightened or uneven bolts cause the leak you were trying to prevent.'
				},
				{
					prompt: 'Why does a pan drop replace only part of the fluid?',
					options: [
						{ text: 'The filter holds most of the fluid', correct: false },
						{ text: 'The fluid evaporates during draining', correct: false },
						{
							text: 'The torque converter, cooler and valve body keep fluid that does not drain',
							correct: true
						}
					],
					explanation:
						'Much of the fluid stays in the converter and circuits, so a pan drop renews only part of it.'
				},
				{
					prompt: 'Which material on the pan magnet is normal wear?',
					options: [
						{ text: 'A thin layer of fine grey paste', correct: true },
						{ text: 'Chunks or slivers of metal', correct: false },
						{ text: 'Large amounts of friction material', correct: false },
						{ text: 'Pieces of plastic thrust washer', correct: false }
					],
					explanation:
						'Fine paste is normal wear; large pieces of metal or friction material point to internal damage.'
				},
				{
					prompt: 'What can happen if the old filter seal stays in the pump bore?',
					options: [
						{
							text: 'The new filter does not seal, so the pump draws air and pressure drops',
							correct: true
						},
						{ text: 'Nothing, the two seals give a better fit', correct: false },
						{ text: 'The fluid level reads high', correct: false }
					],
					explanation:
						'A doubled seal stops the filter seating; air drawn into the pump causes slipping and delayed engagement.'
				},
				{
					prompt: 'Why must only the specified fluid be used?',
					options: [
						{
							text: 'Clutch friction and shift quality are designed around its properties',
							correct: true
						},
						{ text: 'Other fluids are the wrong colour', correct: false },
						{ text: 'Any fluid of the same viscosity works the same', correct: false }
					],
					explanation: 'The wrong fluid can cause shudder, harsh shifts and clutch wear.'
				}
			]
		},
		{
			code: 'ATX-03',
			title: 'Diagnose automatic transmission fluid leaks',
			description:
				'Find the true source of a fluid leak by cleaning, inspecting and, if needed, using dye and an ultraviolet light, then recommend the repair.',
			tier: 1,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{ text: 'Confirm the fluid is transmission fluid by colour, smell and location' },
				{ text: 'Raise and support the vehicle', safety: true },
				{ text: 'Check the fluid level so a low unit is not run further' },
				{ text: 'Clean the suspect area and look for the highest wet point' },
				{ text: 'Add dye if needed, run the vehicle to temperature and inspect with a UV lamp' },
				{ text: 'Check seals, pan gasket, cooler lines, vent and case for the source' },
				{ text: 'Record the leak point and recommended repair on the repair order' }
			],
			specs: [],
			tools: ['Hoist', 'Degreaser', 'Fluorescent dye and UV lamp', 'Inspection mirror'],
			cautions: [
				'Exhaust and transmission parts are hot after a run; wear gloves.',
				'UV lamps can harm eyes: wear the tinted glasses supplied.'
			],
			serviceInfo: ['diagnostic procedure', 'service bulletin'],
			questions: [
				{
					prompt: 'Why look for the highest wet point when tracing a leak?',
					options: [
						{ text: 'Leaks always start at the lowest point', correct: false },
						{ text: 'The highest point is the easiest to reach', correct: false },
						{
							text: 'Fluid runs down and is blown back by airflow, so the source is usually above and ahead of the drip',
							correct: true
						}
					],
					explanation: 'The drip point shows where fluid collects, not where it escapes.'
				},
				{
					prompt:
						'Fluid drips between the engine and transmission. Which sources are possible? Choose two.',
					options: [
						{ text: 'Power steering reservoir cap', correct: false },
						{ text: 'Transmission front pump seal', correct: true },
						{ text: 'Engine rear crankshaft seal', correct: true },
						{ text: 'Rear axle pinion seal', correct: false }
					],
					explanation:
						'Both seals sit in the bell housing area, so fluid colour and dye are used to tell which one is leaking.'
				},
				{
					prompt: 'How does fluorescent dye help?',
					options: [
						{ text: 'It changes colour when the fluid is old', correct: false },
						{
							text: 'It glows under UV light and marks the exact point fluid escapes',
							correct: true
						},
						{ text: 'It seals small leaks', correct: false }
					],
					explanation:
						'Fresh dyed fluid shows the path from the real leak point, even on an oily unit.'
				},
				{
					prompt:
						'Fluid is found around the vent after the level was topped up. What should be checked first?',
					options: [
						{ text: 'Whether the unit is overfilled', correct: true },
						{ text: 'The pan gasket', correct: false },
						{ text: 'The output shaft speed sensor', correct: false }
					],
					explanation: 'An overfilled unit foams and pushes fluid out of the vent.'
				},
				{
					prompt: 'Why clean the area before looking for the leak?',
					options: [
						{ text: 'Dirt blocks the leak', correct: false },
						{ text: 'It is required before adding fluid', correct: false },
						{ text: 'Old fluid hides where the fresh leak starts', correct: true }
					],
					explanation: 'On a clean surface, fresh fluid shows a clear path back to its source.'
				}
			]
		},
		{
			code: 'ATX-04',
			title: 'Flush and flow-test the transmission fluid cooler and lines',
			description:
				'Clear debris from the cooler and lines after an internal failure or before fitting a rebuilt unit, and confirm the cooler flows enough fluid.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{ text: 'Identify the cooler lines and flow direction from service information' },
				{ text: 'Raise and support the vehicle', safety: true },
				{ text: 'Connect the cooler flusher and flush in both directions until clean' },
				{ text: 'Blow out flushing solvent with low-pressure air as directed', safety: true },
				{ text: 'Reconnect lines and torque fittings to specification', safety: true },
				{ text: 'Flow-test the cooler return at idle into a measuring container' },
				{ text: 'Check the level by the temperature procedure and check for leaks' }
			],
			specs: [
				{
					label: 'Cooler return flow in 15 seconds at idle',
					value: 0.9,
					unit: 'L',
					limit: 'minimum'
				},
				{ label: 'Cooler line fitting torque', value: 35, unit: 'N·m', limit: 'nominal' }
			],
			tools: [
				'Cooler line flusher',
				'Measuring container',
				'Line disconnect tools',
				'Torque wrench'
			],
			cautions: [
				'Flushing solvent and hot fluid irritate skin and eyes; wear glasses and gloves.',
				'Run the engine for the flow test only as long as needed; the unit can run low.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why flush the cooler before fitting a rebuilt transmission?',
					options: [
						{ text: 'To cool the new unit faster', correct: false },
						{ text: 'To check the radiator coolant', correct: false },
						{ text: 'Debris from the old failure would be pumped into the new unit', correct: true }
					],
					explanation:
						'Metal and friction particles trapped in the cooler can ruin a new unit within a short time.'
				},
				{
					prompt: 'The flow test gives far less than the specified flow. What does this point to?',
					options: [
						{ text: 'Normal operation at idle', correct: false },
						{ text: 'A restricted cooler or line, or low pump output', correct: true },
						{ text: 'The fluid is too cold', correct: false }
					],
					explanation:
						'Low cooler flow also starves lubrication, so it must be fixed before the vehicle is released.'
				}
			]
		},
		{
			code: 'ATX-05',
			title: 'Adjust the shift cable and transmission range sensor',
			description:
				'Align the selector, shift cable and range sensor so the indicated range matches the transmission and the engine starts only in Park and Neutral.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{ text: 'Apply the parking brake and chock the wheels', safety: true },
				{ text: 'Check that the indicator matches the detent in each range' },
				{ text: 'Set the transmission lever and selector to the specified position' },
				{ text: 'Adjust the cable and lock the adjuster' },
				{
					text: 'Align the range sensor with a gauge pin or by scan-tool reading and torque the bolts'
				},
				{ text: 'Confirm the engine starts only in Park and Neutral', safety: true },
				{ text: 'Confirm the reverse lamps and Park lock work', safety: true }
			],
			specs: [{ label: 'Range sensor bolt torque', value: 10, unit: 'N·m', limit: 'nominal' }],
			tools: ['Alignment gauge pin', 'Scan tool', 'Wheel chocks', 'Torque wrench'],
			cautions: [
				'A misadjusted range sensor can let the engine start in gear: test starting in each range with brakes applied.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'wiring diagram'],
			questions: [
				{
					prompt: 'Why must you confirm the engine will not start in any drive range?',
					options: [
						{
							text: 'A vehicle that starts in gear can move suddenly and hurt someone',
							correct: true
						},
						{ text: 'It protects the starter motor', correct: false },
						{ text: 'It is only required for manual transmissions', correct: false }
					],
					explanation:
						'The range sensor is a safety device as well as an input to the control module.'
				},
				{
					prompt:
						'The display shows D while the transmission is still in N. What is the likely cause?',
					options: [
						{ text: 'Shift cable or range sensor out of adjustment', correct: true },
						{ text: 'Low fluid level', correct: false },
						{ text: 'A failed torque converter', correct: false }
					],
					explanation:
						'When the indicated and actual ranges differ, the linkage or sensor is misaligned.'
				}
			]
		},
		{
			code: 'ATX-06',
			title: 'Retrieve transmission codes and interpret scan-tool data',
			description:
				'Read stored codes and freeze-frame data, then use live data such as fluid temperature, shaft speeds and converter clutch slip to narrow down a fault.',
			tier: 1,
			requiredLevel: 3,
			minHours: 4,
			checklist: [
				{ text: 'Verify the customer concern and check battery voltage' },
				{ text: 'Record all codes and freeze-frame data before clearing anything' },
				{ text: 'Check service bulletins for the symptoms and codes' },
				{
					text: 'Read live data: fluid temperature, input and output speed, gear commanded and actual'
				},
				{ text: 'Use a second person to watch data during the road test', safety: true },
				{ text: 'Compare readings with specifications and known-good values' },
				{ text: 'Follow the diagnostic procedure for the code and record the findings' }
			],
			specs: [
				{ label: 'Battery voltage before testing', value: 12.4, unit: 'V', limit: 'minimum' },
				{
					label: 'Normal operating fluid temperature, lower limit',
					value: 70,
					unit: '°C',
					limit: 'minimum'
				},
				{
					label: 'Normal operating fluid temperature, upper limit',
					value: 95,
					unit: '°C',
					limit: 'maximum'
				},
				{
					label: 'Converter clutch slip when fully applied',
					value: 50,
					unit: 'rpm',
					limit: 'maximum'
				}
			],
			tools: ['Scan tool', 'Digital multimeter', 'Battery tester', 'Service information access'],
			cautions: [
				'The driver drives; a second person reads the scan tool.',
				'Route scan-tool leads so they cannot catch in the pedals.'
			],
			serviceInfo: ['diagnostic procedure', 'service bulletin', 'wiring diagram', 'specifications'],
			questions: [
				{
					prompt: 'Why record codes and freeze-frame data before clearing codes?',
					options: [
						{ text: 'Codes cannot be cleared until recorded', correct: false },
						{ text: 'It resets adaptive values', correct: false },
						{
							text: 'Clearing erases the conditions when the fault set, which guide the diagnosis',
							correct: true
						}
					],
					explanation:
						'Freeze-frame shows speed, temperature and load at the moment of the fault and is lost once cleared.'
				},
				{
					prompt:
						'At steady cruise with the converter clutch commanded fully on, slip reads 180 rpm. What does this suggest?',
					options: [
						{ text: 'A faulty speedometer', correct: false },
						{ text: 'The converter clutch is slipping', correct: true },
						{ text: 'Normal operation', correct: false }
					],
					explanation:
						'When the converter clutch is fully applied, engine and turbine speeds should be almost equal.'
				},
				{
					prompt: 'Why check battery voltage before transmission diagnosis?',
					options: [
						{ text: 'It has no effect on transmission faults', correct: false },
						{
							text: 'Low voltage can cause false codes and erratic solenoid operation',
							correct: true
						},
						{ text: 'The scan tool will not power up otherwise', correct: false }
					],
					explanation: 'Solenoids and modules need stable voltage to work as designed.'
				},
				{
					prompt: 'Which pairs of data help confirm a slipping gear? Choose two.',
					options: [
						{ text: 'Engine speed flaring with no rise in vehicle speed', correct: true },
						{ text: 'Fuel level', correct: false },
						{ text: 'Intake air temperature', correct: false },
						{
							text: 'Input shaft speed compared with output shaft speed and gear ratio',
							correct: true
						}
					],
					explanation:
						'In a given gear, input and output speeds have a fixed ratio; a changing ratio means slip.'
				},
				{
					prompt: 'Why check service bulletins early in the diagnosis?',
					options: [
						{ text: 'Bulletins replace the diagnostic procedure', correct: false },
						{ text: 'They list the service history of the vehicle', correct: false },
						{
							text: 'A known fault may have a published fix, such as a software update',
							correct: true
						}
					],
					explanation:
						'Checking bulletins early avoids long diagnosis of a problem that already has a known fix.'
				}
			]
		},
		{
			code: 'ATX-07',
			title: 'Inspect and replace engine and transmission mounts',
			description:
				'Check mounts for cracked rubber, separation and fluid loss, and replace a failed mount with the powertrain supported.',
			tier: 2,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{ text: 'Inspect mounts for cracks, separation and fluid loss' },
				{ text: 'Check powertrain movement by hand with a pry bar, engine off' },
				{
					text: 'Support the engine or transmission with a support bar or jack before removing a mount',
					safety: true
				},
				{ text: 'Replace the mount and fit the bolts loosely' },
				{
					text: 'Lower the weight onto the mount and torque the bolts to specification',
					safety: true
				},
				{ text: 'Check for hose, cable and exhaust clearance' },
				{ text: 'Road test for vibration and clunk', safety: true }
			],
			specs: [
				{ label: 'Mount-to-body bolt torque', value: 55, unit: 'N·m', limit: 'nominal' },
				{ label: 'Mount through-bolt torque', value: 100, unit: 'N·m', limit: 'nominal' }
			],
			tools: ['Engine support bar or transmission jack', 'Pry bar', 'Torque wrench'],
			cautions: [
				'Never work under a powertrain held only by a jack; support it properly.',
				'Keep hands out from between the mount and bracket while the weight is lowered.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why are mount bolts torqued with the powertrain weight resting on the mount?',
					options: [
						{ text: 'The bolts can only be reached that way', correct: false },
						{ text: 'It makes the mount stiffer', correct: false },
						{
							text: 'So the rubber is not preloaded in a twisted position, which would cause vibration',
							correct: true
						}
					],
					explanation:
						'A mount clamped while twisted carries constant strain and transmits vibration.'
				},
				{
					prompt: 'Which symptom points to a failed transmission mount?',
					options: [
						{ text: 'A high fluid level', correct: false },
						{ text: 'A clunk when shifting into Drive or Reverse', correct: true },
						{ text: 'A delayed upshift', correct: false }
					],
					explanation:
						'A broken mount lets the powertrain move and hit the body under torque changes.'
				}
			]
		},
		{
			code: 'ATX-08',
			title: 'Road test to evaluate automatic transmission operation',
			description:
				'Drive the vehicle to a planned route to check engagement, shift timing and quality, converter clutch operation and noise, and record the findings.',
			tier: 1,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{ text: 'Check fluid level and condition before the road test' },
				{ text: 'Check brakes, tyres and lights are safe for the road', safety: true },
				{ text: 'Check engagement time from Park to Reverse and Drive with the brake applied' },
				{ text: 'Drive at light and heavy throttle and note shift points and quality' },
				{ text: 'Check converter clutch apply and release on a steady cruise' },
				{ text: 'Check manual ranges and downshifts within legal speeds', safety: true },
				{ text: 'Note noises and the conditions when they occur' },
				{ text: 'Record results and compare with the customer concern' }
			],
			specs: [
				{
					label: 'Fluid temperature before judging shift quality',
					value: 70,
					unit: '°C',
					limit: 'minimum'
				},
				{
					label: 'Converter clutch slip when fully applied',
					value: 50,
					unit: 'rpm',
					limit: 'maximum'
				}
			],
			tools: ['Scan tool', 'Road test route sheet'],
			cautions: [
				'Obey traffic law; test at legal speeds on a safe route.',
				'Have a second person operate the scan tool.'
			],
			serviceInfo: ['diagnostic procedure', 'owner information'],
			questions: [
				{
					prompt: 'Why check fluid level before a road test?',
					options: [
						{
							text: 'A low or high level can cause the symptom and further damage during the test',
							correct: true
						},
						{ text: 'The vehicle will not shift without a check', correct: false },
						{ text: 'It is only needed after the test', correct: false }
					],
					explanation:
						'Fluid level is the simplest cause of shift faults and should be ruled out first.'
				},
				{
					prompt:
						'Engagement into Drive takes over two seconds with the engine warm. What could cause this? Choose two.',
					options: [
						{ text: 'Worn clutch seals leaking apply pressure', correct: true },
						{ text: 'A new air filter', correct: false },
						{ text: 'Correct tyre pressures', correct: false },
						{ text: 'Low fluid level', correct: true }
					],
					explanation:
						'Slow engagement means the apply circuit is filling slowly, from low fluid or internal leakage.'
				},
				{
					prompt: 'Why test at both light and heavy throttle?',
					options: [
						{ text: 'To heat the brakes', correct: false },
						{ text: 'Heavy throttle clears codes', correct: false },
						{
							text: 'Shift timing changes with load, and some faults appear only under one condition',
							correct: true
						}
					],
					explanation:
						'The control module sets shift points by throttle and speed, so both must be checked.'
				},
				{
					prompt: 'Why judge shift quality only once the fluid is at operating temperature?',
					options: [
						{ text: 'Shifts do not happen when cold', correct: false },
						{
							text: 'Cold fluid and cold-start strategies change shift timing and feel',
							correct: true
						},
						{ text: 'The scan tool does not work cold', correct: false }
					],
					explanation:
						'Many units delay upshifts or converter apply when cold, which is normal operation.'
				},
				{
					prompt:
						'During the test, the engine speed flares during the 2–3 shift. What does this usually mean?',
					options: [
						{ text: 'The converter clutch is applied', correct: false },
						{ text: 'The oncoming clutch is applying late or slipping', correct: true },
						{ text: 'The shift is normal', correct: false }
					],
					explanation: 'A flare shows that neither gear is holding fully for a moment.'
				}
			]
		},
		{
			code: 'ATX-09',
			title: 'Prepare a transaxle for removal',
			description:
				'Disconnect and secure everything attached to the transaxle and support the engine and transaxle safely, ready for removal under supervision.',
			tier: 3,
			requiredLevel: 2,
			minHours: 6,
			checklist: [
				{ text: 'Disconnect the battery and wait the required time', safety: true },
				{ text: 'Label and disconnect connectors, cables and cooler lines' },
				{ text: 'Drain fluid and remove drive axles as specified' },
				{ text: 'Mark and remove the torque converter bolts' },
				{ text: 'Support the engine with a support bar before removing mounts', safety: true },
				{ text: 'Place the transmission jack and strap the unit to it', safety: true },
				{ text: 'Keep the converter in the transaxle during removal' }
			],
			specs: [
				{
					label: 'Converter-to-flexplate bolt torque (refit)',
					value: 46,
					unit: 'N·m',
					limit: 'nominal'
				},
				{
					label: 'Transaxle-to-engine bolt torque (refit)',
					value: 65,
					unit: 'N·m',
					limit: 'nominal'
				}
			],
			tools: [
				'Transmission jack',
				'Engine support bar',
				'Labels and bags',
				'Flywheel turning tool'
			],
			cautions: [
				'A transaxle is heavy: strap it to the jack and keep people clear when lowering.',
				'The torque converter can slide off its shaft and fall; secure it.',
				'Disconnect the battery before unplugging modules or starter leads.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'wiring diagram'],
			questions: [
				{
					prompt: 'Why must the converter stay with the transaxle during removal?',
					options: [
						{
							text: 'If it stays on the flexplate or slides off, it can fall and damage the pump',
							correct: true
						},
						{ text: 'It is bolted to the engine', correct: false },
						{ text: 'It contains no fluid', correct: false }
					],
					explanation:
						'The converter is heavy and engages the pump drive, so it must move with the transaxle and be secured.'
				},
				{
					prompt: 'Why label connectors and lines during removal?',
					options: [
						{ text: 'To make the job look tidy', correct: false },
						{ text: 'Labels are required on the repair order', correct: false },
						{ text: 'To refit them to the right places and avoid wiring faults', correct: true }
					],
					explanation:
						'Similar connectors swapped on reassembly can cause faults that are hard to find.'
				}
			]
		},
		{
			code: 'ATX-10',
			title: 'Replace a transaxle drive axle seal',
			description:
				'Remove the drive axle, replace the leaking differential side seal without damaging the bore, refit the axle and refill the fluid.',
			tier: 2,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{ text: 'Raise and support the vehicle', safety: true },
				{ text: 'Remove the axle without pulling on the inner joint' },
				{ text: 'Remove the seal without scoring the case bore' },
				{ text: 'Fit the new seal square with a driver to the correct depth' },
				{ text: 'Lubricate the seal lip and refit the axle without cutting the lip' },
				{ text: 'Torque the hub nut and suspension fasteners to specification', safety: true },
				{ text: 'Refill and check the fluid level by the procedure' },
				{ text: 'Check for leaks after a road test', safety: true }
			],
			specs: [
				{ label: 'Drive axle hub nut torque', value: 240, unit: 'N·m', limit: 'nominal' },
				{ label: 'Ball joint pinch bolt torque', value: 60, unit: 'N·m', limit: 'nominal' }
			],
			tools: ['Seal puller', 'Seal driver set', 'Axle separator', 'Torque wrench'],
			cautions: [
				'Do not let the axle hang by its inner joint; support it.',
				'Support the vehicle on stands or a hoist before removing a wheel.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why is the seal lip lubricated before the axle is refitted?',
					options: [
						{ text: 'To hold the seal in place', correct: false },
						{ text: 'To help it seal against the case bore', correct: false },
						{ text: 'So the lip is not torn or run dry at first start', correct: true }
					],
					explanation: 'A dry or cut lip leaks straight away.'
				},
				{
					prompt: 'A new seal leaks after fitting. Which causes are likely? Choose two.',
					options: [
						{ text: 'The seal was fitted crooked', correct: true },
						{ text: 'The fluid was too clean', correct: false },
						{ text: 'The hub nut was torqued correctly', correct: false },
						{ text: 'The bore was scratched during removal', correct: true }
					],
					explanation:
						'A scored bore or a crooked seal leaves a path for fluid around the outside of the seal.'
				}
			]
		},
		{
			code: 'ATX-11',
			title: 'Perform a transmission adaptive relearn after service',
			description:
				'Reset or relearn the shift adaptive values with a scan tool after repairs or a software update, and drive the vehicle as the procedure directs.',
			tier: 2,
			requiredLevel: 3,
			minHours: 1.5,
			checklist: [
				{ text: 'Confirm the fluid level is correct and there are no codes' },
				{ text: 'Connect a battery support unit during module operations', safety: true },
				{ text: 'Reset adaptive values with the scan tool when the procedure calls for it' },
				{ text: 'Bring fluid to the specified relearn temperature' },
				{ text: 'Drive the relearn pattern on a safe route with a second person', safety: true },
				{ text: 'Confirm shift quality and record the relearn on the repair order' }
			],
			specs: [
				{
					label: 'Relearn fluid temperature, lower limit',
					value: 70,
					unit: '°C',
					limit: 'minimum'
				},
				{
					label: 'Relearn fluid temperature, upper limit',
					value: 90,
					unit: '°C',
					limit: 'maximum'
				},
				{
					label: 'Battery voltage during module operations',
					value: 12.5,
					unit: 'V',
					limit: 'minimum'
				}
			],
			tools: ['Scan tool', 'Battery support unit'],
			cautions: [
				'Obey traffic law during the relearn drive and let a second person operate the tool.'
			],
			serviceInfo: ['repair procedure', 'service bulletin', 'owner information'],
			questions: [
				{
					prompt: 'Why is an adaptive relearn needed after some repairs?',
					options: [
						{
							text: 'The module must learn clutch fill times for the new or repaired parts',
							correct: true
						},
						{ text: 'To clear the fluid life counter only', correct: false },
						{ text: 'It changes the gear ratios', correct: false }
					],
					explanation:
						'Old adaptive values suit worn parts and give harsh or slipping shifts with new ones.'
				},
				{
					prompt: 'Why must the fluid be within a temperature window during the relearn?',
					options: [
						{
							text: 'Values learned at the wrong temperature do not suit normal running',
							correct: true
						},
						{ text: 'The scan tool blocks the relearn outside it', correct: false },
						{ text: 'It does not matter', correct: false }
					],
					explanation:
						'Fluid viscosity changes fill times, so learning is done at normal operating temperature.'
				}
			]
		},
		{
			code: 'ATX-12',
			title: 'Test shift and pressure control solenoids electrically',
			description:
				'Measure solenoid resistance and check circuit integrity and commanded operation to confirm whether a solenoid or its wiring is at fault.',
			tier: 3,
			requiredLevel: 2,
			minHours: 3,
			checklist: [
				{ text: 'Identify solenoid circuits from the wiring diagram' },
				{
					text: 'Disconnect the battery before unplugging the transmission connector',
					safety: true
				},
				{ text: 'Measure solenoid resistance and note the fluid temperature' },
				{ text: 'Check circuits for opens and shorts to ground and voltage' },
				{ text: 'Command the solenoids with the scan tool and check operation' },
				{ text: 'Record readings and compare with specification' }
			],
			specs: [
				{
					label: 'Shift solenoid resistance at 20 °C, lower limit',
					value: 10,
					unit: 'Ω',
					limit: 'minimum'
				},
				{
					label: 'Shift solenoid resistance at 20 °C, upper limit',
					value: 16,
					unit: 'Ω',
					limit: 'maximum'
				},
				{
					label: 'Pressure control solenoid resistance at 20 °C, lower limit',
					value: 3,
					unit: 'Ω',
					limit: 'minimum'
				},
				{
					label: 'Pressure control solenoid resistance at 20 °C, upper limit',
					value: 7,
					unit: 'Ω',
					limit: 'maximum'
				}
			],
			tools: ['Digital multimeter', 'Wiring diagram', 'Back-probe pins', 'Scan tool'],
			cautions: ['Hot fluid can drip from the connector area; wear gloves and glasses.'],
			serviceInfo: ['diagnostic procedure', 'wiring diagram', 'specifications'],
			questions: [
				{
					prompt: 'Why note the temperature when measuring solenoid resistance?',
					options: [
						{ text: 'The meter reads wrong when hot', correct: false },
						{ text: 'It is not needed', correct: false },
						{ text: 'Coil resistance rises as temperature rises', correct: true }
					],
					explanation: 'Resistance specifications are given at a set temperature.'
				},
				{
					prompt: 'A shift solenoid reads 0.4 Ω. What does this mean?',
					options: [
						{ text: 'The solenoid is in good order', correct: false },
						{ text: 'The coil is shorted', correct: true },
						{ text: 'The coil is open', correct: false }
					],
					explanation:
						'A reading far below specification means shorted windings and too much current.'
				}
			]
		}
	]
};
