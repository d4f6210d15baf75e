import type { AreaDef } from '../../../framework/types';

export const area: AreaDef = {
	code: 'HAC',
	name: 'Heating and air conditioning',
	tasks: [
		{
			code: 'HAC-01',
			title: 'Identify the refrigerant in a system before recovery',
			description:
				'Confirm the type and purity of the refrigerant in a vehicle before connecting recovery equipment, so contaminated or unknown gas never enters the shop machine or its supply.',
			tier: 1,
			requiredLevel: 4,
			minHours: 1,
			checklist: [
				{
					text: 'Puts on eye protection and refrigerant-resistant gloves',
					safety: true
				},
				{ text: 'Reads the under-hood label for the refrigerant type and charge' },
				{
					text: 'Inspects the service ports for non-standard fittings, add-on caps or sealer residue'
				},
				{ text: 'Checks the identifier sample filter and fits the correct port adapter' },
				{ text: 'Connects to the low-side port with the engine off and runs the identifier' },
				{ text: 'Records the refrigerant type, purity and air content shown' },
				{
					text: 'Tags a failed or flammable sample and sends it to dedicated contaminated-refrigerant recovery',
					safety: true
				},
				{
					text: 'Disconnects the identifier and refits the port caps',
					safety: true
				}
			],
			specs: [
				{
					label: 'Refrigerant purity for recovery into shop equipment',
					value: 98,
					unit: '%',
					limit: 'minimum'
				}
			],
			tools: [
				'Refrigerant identifier',
				'Service port adapters',
				'Spare sample filters',
				'Eye protection',
				'Refrigerant-resistant gloves'
			],
			cautions: [
				'Escaping refrigerant can freeze skin and eyes.',
				'Some contaminants are flammable hydrocarbons: keep sparks and flames away.',
				'Do not connect a recovery machine until the refrigerant has been identified.'
			],
			serviceInfo: ['specifications', 'safety data sheet', 'repair procedure'],
			questions: [
				{
					prompt: 'Why is refrigerant identified before it is recovered?',
					options: [
						{
							text: 'Contaminated gas would spoil the recovery machine and everything in its tank',
							correct: true
						},
						{
							text: 'The identifier tells you how much refrigerant is in the system',
							correct: false
						},
						{
							text: 'Recovery machines only work after an identifier has been connected',
							correct: false
						},
						{ text: 'It replaces the need for a leak test', correct: false }
					],
					explanation:
						'One bad charge mixed into the shop tank contaminates all the refrigerant in it and can damage every vehicle it is later charged into.'
				},
				{
					prompt: 'The identifier reports 92 % purity. What do you do?',
					options: [
						{ text: 'Recover it normally; anything above 90 % is acceptable', correct: false },
						{ text: 'Vent the charge, because contaminated gas cannot be reused', correct: false },
						{ text: 'Add fresh refrigerant to raise the purity, then recover', correct: false },
						{
							text: 'Do not use the shop machine; tag the vehicle and recover with dedicated contaminated-refrigerant equipment',
							correct: true
						}
					],
					explanation:
						'Below the purity limit the charge must be kept separate and sent for reclaim, and venting is never allowed.'
				},
				{
					prompt:
						'The identifier detects hydrocarbon in the sample. What is the main extra hazard?',
					options: [
						{
							text: 'The gas is flammable, so any spark or flame could ignite a release',
							correct: true
						},
						{ text: 'The system pressure will be too low to recover', correct: false },
						{ text: 'The compressor oil will have turned acidic', correct: false }
					],
					explanation:
						'Hydrocarbon refrigerants and contaminants burn readily, so ignition sources must be kept away and the gas recovered with suitable equipment.'
				},
				{
					prompt: 'Where do you first find which refrigerant a vehicle was built to use?',
					options: [
						{ text: 'The colour of the service port caps alone', correct: false },
						{ text: 'The compressor drive belt', correct: false },
						{ text: 'The air conditioning label under the hood', correct: true },
						{ text: 'The tyre placard', correct: false }
					],
					explanation:
						'The under-hood label gives the intended refrigerant, oil and charge weight, and the identifier then confirms what is actually inside.'
				},
				{
					prompt: 'The identifier shows a high air content. What does that tell you?',
					options: [
						{ text: 'The cabin air filter is blocked', correct: false },
						{
							text: 'The system has been open or badly evacuated, and air will raise high-side pressure',
							correct: true
						},
						{ text: 'The system is fully charged', correct: false },
						{ text: 'The refrigerant is a flammable type', correct: false }
					],
					explanation:
						'Air does not condense in the system, so it takes up condenser space, raises head pressure and reduces cooling.'
				}
			]
		},
		{
			code: 'HAC-02',
			title: 'Recover refrigerant from an air conditioning system',
			description:
				'Remove the full refrigerant charge into recovery equipment matched to that refrigerant, confirm nothing is left, and measure the charge and oil removed, releasing nothing to the air.',
			tier: 1,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{
					text: 'Confirms the refrigerant has been identified and matches the recovery machine',
					safety: true
				},
				{
					text: 'Puts on eye protection and refrigerant-resistant gloves',
					safety: true
				},
				{ text: 'Checks the machine tank is below its fill limit and the filter is in date' },
				{ text: 'Connects the high- and low-side couplers and opens them' },
				{ text: 'Runs recovery until the system reaches vacuum and the machine stops' },
				{
					text: 'Waits and watches the gauges, and recovers again if the pressure rises',
					safety: true
				},
				{ text: 'Records the weight recovered and measures the oil drained out' },
				{
					text: 'Closes the couplers and removes the hoses without venting any refrigerant',
					safety: true
				}
			],
			specs: [{ label: 'Recovery tank fill level', value: 80, unit: '%', limit: 'maximum' }],
			tools: [
				'Recovery, recycling and recharging machine for the refrigerant type',
				'Refrigerant identifier',
				'Eye protection',
				'Refrigerant-resistant gloves',
				'Graduated oil bottle'
			],
			cautions: [
				'Releasing refrigerant to the air is illegal and harms the environment.',
				'Liquid refrigerant causes frostbite: keep eyes and skin covered.',
				'High-side pressure can exceed 200 psi: only disconnect couplers with their valves closed.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'safety data sheet'],
			questions: [
				{
					prompt:
						'A few minutes after the machine reaches vacuum and stops, the gauges rise above zero. What should you do?',
					options: [
						{ text: 'Run recovery again until the pressure stays down', correct: true },
						{ text: 'Disconnect; the small amount left does not matter', correct: false },
						{ text: 'Open the system and let the rest escape', correct: false },
						{ text: 'Start evacuation straight away', correct: false }
					],
					explanation:
						'A pressure rise means refrigerant is still boiling out of the oil or cold parts, and it must be recovered, not released when the system is opened.'
				},
				{
					prompt: 'Why measure the oil that comes out during recovery?',
					options: [
						{ text: 'The same amount of fresh oil must be put back', correct: true },
						{ text: 'To calculate the refrigerant purity', correct: false },
						{ text: 'The law requires the oil to be weighed and reported', correct: false },
						{ text: 'To know how long to evacuate', correct: false }
					],
					explanation:
						'Too little oil starves the compressor and too much reduces cooling, so what was removed is replaced.'
				},
				{
					prompt: 'Why must a recovery machine be matched to the refrigerant type?',
					options: [
						{ text: 'It does not matter if the machine is purged first', correct: false },
						{
							text: 'Mixing refrigerant types contaminates the tank and makes the gas unusable',
							correct: true
						},
						{ text: 'Different refrigerants need a different mains voltage', correct: false }
					],
					explanation:
						'Refrigerants cannot be separated in the shop once mixed, and fittings differ to stop cross-connection.'
				},
				{
					prompt: 'Which personal protection is needed when connecting recovery hoses? Choose two.',
					options: [
						{ text: 'Hearing protection', correct: false },
						{ text: 'A paper dust mask', correct: false },
						{ text: 'Safety glasses with side shields', correct: true },
						{ text: 'Refrigerant-resistant gloves', correct: true }
					],
					explanation:
						'A coupler that leaks or releases liquid can freeze the eyes and skin in an instant.'
				},
				{
					prompt:
						'The machine stops with a tank-full warning part-way through recovery. What is the correct action?',
					options: [
						{ text: 'Vent some refrigerant from the tank to make room', correct: false },
						{
							text: 'Change to an empty tank that is rated for the refrigerant, then continue',
							correct: true
						},
						{ text: 'Override the warning and keep recovering', correct: false }
					],
					explanation:
						'The fill limit leaves room for the liquid to expand with temperature, and overriding it risks rupturing the tank.'
				}
			]
		},
		{
			code: 'HAC-03',
			title: 'Evacuate and recharge an air conditioning system by weight',
			description:
				'After repairs, pull a deep vacuum to remove air and moisture, prove the system holds it, and charge the exact weight of the correct refrigerant and oil.',
			tier: 1,
			requiredLevel: 3,
			minHours: 4,
			checklist: [
				{
					text: 'Confirms all repairs are complete with new lubricated seals and fittings torqued',
					safety: true
				},
				{
					text: 'Adds the correct type and amount of oil for what was removed and the parts replaced',
					safety: true
				},
				{ text: 'Connects the couplers and evacuates for the specified time' },
				{ text: 'Isolates the pump and watches that the vacuum holds' },
				{ text: 'Looks up the charge weight on the label or in the service information' },
				{
					text: 'Charges the exact weight of the correct refrigerant, liquid into the high side with the engine off',
					safety: true
				},
				{ text: 'Runs the system and checks pressures and vent outlet temperature' },
				{
					text: 'Leak-checks the fittings, refits the caps and records the charge',
					safety: true
				}
			],
			specs: [
				{ label: 'Vent outlet temperature after recharge', value: 7, unit: '°C', limit: 'maximum' },
				{
					label: 'Engine speed for the post-charge check',
					value: 1500,
					unit: 'rpm',
					limit: 'nominal'
				}
			],
			tools: [
				'Recovery, recycling and recharging machine or manifold gauges, vacuum pump and charging scale',
				'Vacuum gauge',
				'Oil injector',
				'Correct compressor oil',
				'Eye protection and gloves'
			],
			cautions: [
				'Use only the refrigerant and oil named on the label; mixing them can damage the system.',
				'Never charge liquid into the low side with the compressor running; it can break the compressor.',
				'Wear eye protection and gloves when connecting and disconnecting hoses.'
			],
			serviceInfo: ['specifications', 'repair procedure'],
			questions: [
				{
					prompt: 'What does pulling a deep vacuum do for the system?',
					options: [
						{ text: 'Cools the condenser before charging', correct: false },
						{ text: 'Removes air and boils off moisture', correct: true },
						{ text: 'Cleans old oil out of the compressor', correct: false },
						{ text: 'Seals small leaks', correct: false }
					],
					explanation:
						'Air raises pressures and moisture forms acid and ice, and a deep vacuum lowers the boiling point so water boils off and is pumped out.'
				},
				{
					prompt:
						'After the pump is isolated, the vacuum reading slowly rises. What does this mean?',
					options: [
						{ text: 'The system has a leak or is still releasing moisture', correct: true },
						{ text: 'The system is ready to charge', correct: false },
						{ text: 'The vacuum pump oil is too thin', correct: false },
						{ text: 'The refrigerant is contaminated', correct: false }
					],
					explanation:
						'A sealed, dry system holds vacuum, so a rise means air is getting in or water is still boiling off.'
				},
				{
					prompt: 'Why are modern systems charged by weight instead of by gauge pressures?',
					options: [
						{ text: 'Gauges cannot read the pressures of newer refrigerants', correct: false },
						{ text: 'Weighing is faster than reading gauges', correct: false },
						{
							text: 'Small systems need an exact amount, and pressures change with temperature too much to judge it',
							correct: true
						}
					],
					explanation:
						'A few grams over or under can change performance noticeably, and pressure alone cannot show how much is in the system.'
				},
				{
					prompt: 'Why must an electrically driven compressor get exactly the oil type specified?',
					options: [
						{
							text: 'Its motor sits in the refrigerant and oil, so the oil must insulate electrically',
							correct: true
						},
						{ text: 'Electric compressors use no oil at all', correct: false },
						{ text: 'Any compressor oil works if it is the right viscosity', correct: false }
					],
					explanation:
						'The wrong oil can let high voltage leak to the compressor body, which is a shock hazard and damages the compressor.'
				},
				{
					prompt:
						'A system has high high-side pressure and poor cooling after a recharge. What is a likely cause?',
					options: [
						{ text: 'The cabin air filter is new', correct: false },
						{ text: 'The evacuation was too long', correct: false },
						{ text: 'It was overcharged', correct: true },
						{ text: 'It was undercharged', correct: false }
					],
					explanation:
						'Too much refrigerant floods the condenser, raising head pressure and reducing how much heat the system can reject.'
				},
				{
					prompt: 'Why is liquid refrigerant charged into the high side with the engine off?',
					options: [
						{
							text: 'Liquid cannot reach a running compressor, which it could damage',
							correct: true
						},
						{ text: 'The low-side port only accepts vapour', correct: false },
						{ text: 'It makes the charge heavier', correct: false }
					],
					explanation:
						'A compressor can only pump vapour, and a slug of liquid can break its valves or pistons.'
				}
			]
		},
		{
			code: 'HAC-04',
			title: 'Perform an air conditioning performance test',
			description:
				'Run the system under controlled conditions and compare pressures and vent temperature with what the service information expects for the ambient conditions, then interpret the results.',
			tier: 1,
			requiredLevel: 4,
			minHours: 3,
			checklist: [
				{
					text: 'Puts on eye protection and connects the gauges with the engine off, routing hoses away from the fan and belt',
					safety: true
				},
				{ text: 'Checks the drive belt, condenser face and cooling fans' },
				{ text: 'Measures ambient temperature and humidity near the condenser' },
				{
					text: 'Sets maximum cooling, highest blower speed and the air inlet mode the procedure calls for'
				},
				{ text: 'Holds the engine at the test speed and lets readings stabilise' },
				{ text: 'Reads high- and low-side pressures and the centre vent outlet temperature' },
				{
					text: 'Compares readings with the chart in the service information and states a diagnosis'
				},
				{
					text: 'Removes the gauges with the engine off and refits the caps',
					safety: true
				}
			],
			specs: [
				{ label: 'Low-side pressure, 27 °C ambient', value: 35, unit: 'psi', limit: 'nominal' },
				{ label: 'High-side pressure, 27 °C ambient', value: 200, unit: 'psi', limit: 'nominal' },
				{ label: 'Centre vent outlet temperature', value: 7, unit: '°C', limit: 'maximum' },
				{ label: 'Engine speed during the test', value: 1500, unit: 'rpm', limit: 'nominal' }
			],
			tools: [
				'Manifold gauge set or service machine',
				'Probe thermometer',
				'Humidity gauge',
				'Pressure-temperature chart',
				'Eye protection'
			],
			cautions: [
				'Keep hands, hoses and leads away from the fan and belts.',
				'High-side lines and the compressor get hot enough to burn.',
				'Run the engine only with exhaust extraction or good ventilation.'
			],
			serviceInfo: ['specifications', 'diagnostic procedure'],
			questions: [
				{
					prompt:
						'Both pressures are high and cooling is poor, and the condenser fan is not running. What is the likely cause?',
					options: [
						{ text: 'A blocked cabin air filter', correct: false },
						{ text: 'Not enough airflow across the condenser', correct: true },
						{ text: 'Low refrigerant charge', correct: false },
						{ text: 'A restricted expansion device', correct: false }
					],
					explanation:
						'Without airflow the condenser cannot shed heat, so pressure builds on both sides and cooling falls.'
				},
				{
					prompt:
						'Both the low and high sides read below normal and vent air is only slightly cool. What is the likely cause?',
					options: [
						{ text: 'Low refrigerant charge', correct: true },
						{ text: 'Overcharge', correct: false },
						{ text: 'Air in the system', correct: false },
						{ text: 'A failed condenser fan', correct: false }
					],
					explanation:
						'With too little refrigerant there is not enough to build normal pressure on either side, and a leak check should follow.'
				},
				{
					prompt:
						'The low side pulls very low or into vacuum, and the high side is low. What does this suggest?',
					options: [
						{ text: 'An overcharged system', correct: false },
						{
							text: 'A restriction at the expansion device or in the high-side line',
							correct: true
						},
						{ text: 'A normal system on a cold day', correct: false }
					],
					explanation:
						'A blockage starves the low side while the high side never builds normal pressure, and the line often frosts at the restriction.'
				},
				{
					prompt: 'Why do you record ambient temperature and humidity for the test?',
					options: [
						{ text: 'The law requires it on the repair order', correct: false },
						{ text: 'To set the blower speed', correct: false },
						{ text: 'Normal pressures and vent temperature depend on them', correct: true }
					],
					explanation:
						'The same system reads very differently on a mild dry day and a hot humid one, so the chart is read for the conditions.'
				},
				{
					prompt: 'Why is the engine held at a raised speed during the test?',
					options: [
						{
							text: 'The compressor and charging system then give steady, typical output',
							correct: true
						},
						{ text: 'Idle speed is too low for the gauges to read', correct: false },
						{ text: 'It stops the compressor clutch cycling', correct: false }
					],
					explanation:
						'At idle the compressor output and fan airflow vary, so a fixed raised speed gives readings that can be compared with the chart.'
				},
				{
					prompt:
						'At 27 °C ambient you read 35 psi low side, 200 psi high side and 6 °C at the centre vent. How do you judge the system?',
					options: [
						{ text: 'Overcharged', correct: false },
						{ text: 'Restricted', correct: false },
						{ text: 'Performing normally', correct: true },
						{ text: 'Undercharged', correct: false }
					],
					explanation: 'All three readings sit within typical values for that ambient temperature.'
				}
			]
		},
		{
			code: 'HAC-05',
			title: 'Locate a refrigerant leak with dye or an electronic detector',
			description:
				'Find where refrigerant is escaping using an electronic detector, ultraviolet dye or both, and confirm the leak point before replacing parts.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{
					text: 'Wears eye protection and confirms the system has enough pressure to leak-test',
					safety: true
				},
				{ text: 'Looks for oily residue at fittings, hoses, the compressor and the condenser' },
				{ text: 'Warms up or calibrates the electronic detector for the refrigerant type' },
				{
					text: 'With the engine off, moves the probe slowly along the underside of each fitting and hose'
				},
				{ text: 'Checks the evaporator at the drain outlet or the vent nearest it' },
				{
					text: 'Adds only the approved amount of compatible dye if dye is used, then runs the system'
				},
				{
					text: 'Inspects with the ultraviolet lamp and glasses and confirms with a second method'
				},
				{ text: 'Cleans dye traces after repair so a new leak can be told from an old one' }
			],
			specs: [
				{
					label: 'Static system pressure for an electronic leak search',
					value: 50,
					unit: 'psi',
					limit: 'minimum'
				},
				{
					label: 'Probe distance from the surface being checked',
					value: 5,
					unit: 'mm',
					limit: 'maximum'
				}
			],
			tools: [
				'Electronic leak detector for the refrigerant type',
				'Ultraviolet lamp and glasses',
				'Dye injector and approved dye',
				'Soap solution',
				'Eye protection'
			],
			cautions: [
				'Wear the filtering glasses when using an ultraviolet lamp.',
				'Keep clear of the fan and belts whenever the engine is running.'
			],
			serviceInfo: ['diagnostic procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why is the detector probe moved along the underside of fittings?',
					options: [
						{ text: 'Refrigerant is heavier than air and sinks', correct: true },
						{ text: 'The underside is where fittings are always weakest', correct: false },
						{ text: 'The detector only works pointing upward', correct: false }
					],
					explanation:
						'Escaping refrigerant flows downward, so the strongest concentration is below the leak.'
				},
				{
					prompt: 'Why is the electronic search done with the engine off?',
					options: [
						{ text: 'System pressure is zero with the engine running', correct: false },
						{ text: 'Fan airflow would blow the leaking gas away from the probe', correct: true },
						{ text: 'The detector is affected by ignition noise only', correct: false }
					],
					explanation:
						'A moving air stream dilutes and scatters the refrigerant, so a real leak can be missed.'
				},
				{
					prompt: 'Why add only the approved amount of dye?',
					options: [
						{
							text: 'Extra dye dilutes the oil and can harm components or break warranty terms',
							correct: true
						},
						{ text: 'More dye makes leaks harder to see', correct: false },
						{ text: 'Dye is flammable in large amounts', correct: false }
					],
					explanation:
						'Dye is carried in the system oil, and too much changes the oil the compressor relies on.'
				}
			]
		},
		{
			code: 'HAC-06',
			title: 'Diagnose an air conditioning compressor clutch circuit',
			description:
				'Find why a compressor clutch does not engage or slips, working through the controls, power and ground supply, coil and air gap.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{
					text: 'Confirms there is enough refrigerant pressure for the controls to allow engagement'
				},
				{
					text: 'Scans for codes and checks the A/C request, pressure input and clutch command data'
				},
				{ text: 'Checks the fuse and clutch relay' },
				{
					text: 'Back-probes the clutch connector with the engine off and keeps hands clear once it runs',
					safety: true
				},
				{ text: 'Measures feed voltage and ground voltage drop with the clutch commanded on' },
				{ text: 'Measures coil resistance with the connector unplugged' },
				{ text: 'Measures the air gap with feeler gauges at several points' },
				{
					text: 'Repairs and confirms the clutch engages and cycles normally',
					safety: true
				}
			],
			specs: [
				{ label: 'Clutch coil resistance', value: 3.5, unit: 'Ω', limit: 'nominal' },
				{ label: 'Clutch air gap', value: 0.5, unit: 'mm', limit: 'nominal' },
				{
					label: 'Voltage drop in clutch feed and ground',
					value: 0.5,
					unit: 'V',
					limit: 'maximum'
				},
				{ label: 'Clutch coil current', value: 4, unit: 'A', limit: 'maximum' }
			],
			tools: [
				'Scan tool',
				'Digital multimeter',
				'Feeler gauges',
				'Back-probe pins',
				'Wiring diagram'
			],
			cautions: [
				'The clutch can engage without warning while the engine runs: keep hands and tools clear.',
				'Do not bridge the pressure switch to run a low system; the compressor can be ruined.'
			],
			serviceInfo: ['wiring diagram', 'diagnostic procedure', 'specifications'],
			questions: [
				{
					prompt:
						'With the clutch commanded on, the coil gets 12.3 V, ground drop is 0.05 V, and coil resistance is 3.4 Ω, but the clutch does not pull in. What is the likely cause?',
					options: [
						{ text: 'The clutch relay has failed', correct: false },
						{ text: 'The coil is open', correct: false },
						{ text: 'The fuse has blown', correct: false },
						{ text: 'The air gap is too large', correct: true }
					],
					explanation:
						'Power, ground and coil are all good, so the magnet is working but cannot pull the plate across an excessive gap.'
				},
				{
					prompt: 'Why not jump the low-pressure switch to make the clutch engage?',
					options: [
						{ text: 'It would blow the clutch fuse', correct: false },
						{ text: 'It is the quickest way to test a clutch and is fine', correct: false },
						{
							text: 'The compressor could run without enough refrigerant and oil and be damaged',
							correct: true
						}
					],
					explanation:
						'The switch protects the compressor, which relies on refrigerant to carry oil around it.'
				},
				{
					prompt: 'The clutch coil measures 0.4 Ω. What does this mean?',
					options: [
						{ text: 'The coil is within specification', correct: false },
						{ text: 'The coil is shorted and will draw too much current', correct: true },
						{ text: 'The coil is open', correct: false }
					],
					explanation:
						'A reading far below specification means shorted windings, which overheat and can blow the fuse or burn the relay.'
				}
			]
		},
		{
			code: 'HAC-07',
			title: 'Replace a cabin air filter',
			description:
				'Replace the cabin air filter, clean debris from its housing and confirm full airflow, fitting the new filter the right way round.',
			tier: 3,
			requiredLevel: 4,
			minHours: 0.5,
			checklist: [
				{ text: 'Locates the filter access from the service information' },
				{
					text: 'Switches the ignition off so the blower cannot run',
					safety: true
				},
				{ text: 'Removes the old filter, noting its airflow arrow' },
				{ text: 'Clears leaves and debris from the housing and checks for moisture' },
				{ text: 'Fits the new filter with the airflow arrow the correct way and seated all round' },
				{ text: 'Refits the cover and checks airflow on every blower speed' }
			],
			specs: [],
			tools: ['Trim removal tools', 'Shop vacuum', 'Work light', 'Gloves and dust mask'],
			cautions: [
				'Old filters can hold mould, dust and rodent droppings: wear gloves and a dust mask.',
				'Switch the ignition off so the blower wheel cannot start near your fingers.'
			],
			serviceInfo: ['maintenance schedule', 'repair procedure', 'owner information'],
			questions: [
				{
					prompt: 'Why does the airflow arrow on a cabin filter matter?',
					options: [
						{ text: 'It only matters for the label facing the technician', correct: false },
						{ text: 'Reversed, the blower will run backwards', correct: false },
						{
							text: 'The filter is built to work in one direction; reversed it filters poorly and can shed debris',
							correct: true
						}
					],
					explanation:
						'Layered filter media and seals are designed for one flow direction, so fitting it backwards lowers filtering and can dump trapped dirt.'
				},
				{
					prompt: 'Which complaints can a blocked cabin air filter cause? Choose two.',
					options: [
						{ text: 'Weak airflow from the vents', correct: true },
						{ text: 'Musty smell or slow window demisting', correct: true },
						{ text: 'High-side pressure too low', correct: false },
						{ text: 'Compressor clutch not engaging', correct: false }
					],
					explanation:
						'A clogged filter restricts airflow and traps damp debris, which smells and reduces demisting.'
				}
			]
		},
		{
			code: 'HAC-08',
			title: 'Diagnose blend door and climate control faults',
			description:
				'Find why the system delivers the wrong temperature or the wrong outlets, using the scan tool, actuator feedback and a check of the doors and linkages.',
			tier: 2,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{
					text: 'Verifies the complaint at every temperature and mode setting and listens for actuator noise'
				},
				{ text: 'Scans the climate control module and records codes' },
				{
					text: 'Commands each actuator with the scan tool and keeps fingers clear of exposed doors and gears',
					safety: true
				},
				{ text: 'Checks actuator power, ground and reference voltage' },
				{ text: 'Checks that the feedback signal changes smoothly through the full travel' },
				{ text: 'Inspects the door and linkage for binding or breakage' },
				{
					text: 'Follows the restraint disabling procedure if dash parts near an airbag must be removed',
					safety: true
				},
				{ text: 'Repairs, runs actuator calibration and verifies every mode and temperature' }
			],
			specs: [
				{ label: 'Actuator reference voltage', value: 5, unit: 'V', limit: 'nominal' },
				{ label: 'Position feedback at end of travel', value: 0.5, unit: 'V', limit: 'minimum' },
				{ label: 'Position feedback at end of travel', value: 4.5, unit: 'V', limit: 'maximum' }
			],
			tools: [
				'Scan tool',
				'Digital multimeter',
				'Back-probe pins',
				'Trim removal tools',
				'Wiring diagram'
			],
			cautions: [
				'Keep fingers clear of actuator gears and doors while commanding them.',
				'Dash removal can involve airbag parts: follow the restraint disabling procedure.'
			],
			serviceInfo: ['diagnostic procedure', 'wiring diagram', 'repair procedure'],
			questions: [
				{
					prompt:
						'A clicking noise comes from behind the dash whenever the temperature is changed. What is likely?',
					options: [
						{ text: 'A stripped actuator gear or a broken door', correct: true },
						{ text: 'Low refrigerant charge', correct: false },
						{ text: 'A blocked heater core', correct: false },
						{ text: 'A failed blower resistor', correct: false }
					],
					explanation:
						'An actuator skipping teeth or hitting a broken door clicks as it tries to reach its commanded position.'
				},
				{
					prompt: 'Why is a calibration run after replacing a blend door actuator?',
					options: [
						{ text: 'The module has to learn the new actuator end stops', correct: true },
						{ text: 'To charge the actuator battery', correct: false },
						{ text: 'To reset the refrigerant charge', correct: false }
					],
					explanation:
						'Without learned end stops the module cannot place the door accurately, so the temperature will be wrong.'
				},
				{
					prompt:
						'A blend door feedback signal stays at 4.9 V whatever position is commanded. What is a likely cause?',
					options: [
						{ text: 'Low refrigerant charge', correct: false },
						{
							text: 'An open in the sensor low-reference circuit, or the signal shorted to the 5 V reference',
							correct: true
						},
						{ text: 'The door is working normally at full hot', correct: false }
					],
					explanation:
						'A position signal pinned near the reference voltage and not moving points to a circuit fault, not to a real door position.'
				}
			]
		},
		{
			code: 'HAC-09',
			title: 'Diagnose low heater output and heater core flow',
			description:
				'Find why the heater blows cool air by checking coolant level and temperature, flow through the heater core and the blend door, then restore full heat.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{
					text: 'Checks coolant level with the engine cold and never opens a hot pressure cap',
					safety: true
				},
				{ text: 'Confirms the engine reaches normal operating temperature' },
				{ text: 'Measures heater inlet and outlet hose temperatures with the engine warm' },
				{ text: 'Confirms the blend door reaches full hot' },
				{ text: 'Bleeds trapped air from the cooling system as the procedure directs' },
				{ text: 'Back-flushes or replaces a restricted heater core' },
				{
					text: 'Verifies vent temperature, checks for leaks and corrects the coolant level',
					safety: true
				}
			],
			specs: [
				{ label: 'Normal engine coolant temperature', value: 90, unit: '°C', limit: 'nominal' },
				{
					label: 'Heater outlet air temperature, engine warm',
					value: 50,
					unit: '°C',
					limit: 'minimum'
				},
				{ label: 'Cooling system pressure cap rating', value: 16, unit: 'psi', limit: 'nominal' }
			],
			tools: [
				'Infrared thermometer',
				'Probe thermometer',
				'Scan tool',
				'Coolant funnel or vacuum fill tool',
				'Cooling system pressure tester'
			],
			cautions: [
				'Never open the pressure cap on a hot system; the coolant can scald.',
				'Hoses and the engine are hot: wear gloves.',
				'Coolant is poisonous to people and animals: clean up spills.'
			],
			serviceInfo: ['diagnostic procedure', 'repair procedure', 'specifications'],
			questions: [
				{
					prompt:
						'With the engine warm, the heater inlet hose is hot but the outlet hose is much cooler. What is likely?',
					options: [
						{ text: 'The blend door is stuck at full hot', correct: false },
						{ text: 'The coolant is overfilled', correct: false },
						{ text: 'The heater core is restricted', correct: true },
						{ text: 'The thermostat is stuck open', correct: false }
					],
					explanation:
						'Hot coolant is arriving but not flowing through well, so it loses its heat before leaving the core.'
				},
				{
					prompt:
						'Both heater hoses are only lukewarm and the engine never reaches normal temperature. What is likely?',
					options: [
						{ text: 'The blower motor is weak', correct: false },
						{ text: 'The thermostat is stuck open', correct: true },
						{ text: 'The heater core is blocked', correct: false }
					],
					explanation:
						'If the engine itself does not get warm, there is no heat to deliver, and a thermostat stuck open is the common cause.'
				},
				{
					prompt: 'Why is coolant level checked with the engine cold?',
					options: [
						{ text: 'Coolant level cannot be seen when warm', correct: false },
						{ text: 'The level is only correct when the thermostat is open', correct: false },
						{ text: 'Opening a hot, pressurised system can spray scalding coolant', correct: true }
					],
					explanation:
						'Under pressure, hot coolant is above its normal boiling point and flashes to steam when the cap is released.'
				}
			]
		},
		{
			code: 'HAC-10',
			title: 'Check electric cooling fan operation',
			description:
				'Confirm the electric cooling fans run when the engine is hot and when the air conditioning is on, and diagnose a fan, relay, module or sensor fault when they do not.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{
					text: 'Keeps hands, tools and clothing clear of the fans, which can start with the ignition off',
					safety: true
				},
				{ text: 'Reads coolant temperature, A/C pressure and fan command on the scan tool' },
				{ text: 'Commands the fans with the scan tool, or warms the engine with the A/C on' },
				{ text: 'Checks fuses and relays and measures voltage at the fan motor' },
				{ text: 'Measures feed and ground voltage drop under load' },
				{
					text: 'Checks the motor current, that the fan spins freely and the blades are undamaged'
				},
				{
					text: 'Repairs and verifies the fans switch on with engine temperature and with the A/C',
					safety: true
				}
			],
			specs: [
				{ label: 'Fan switch-on coolant temperature', value: 100, unit: '°C', limit: 'nominal' },
				{ label: 'Voltage drop in fan feed and ground', value: 0.5, unit: 'V', limit: 'maximum' },
				{ label: 'Fan motor current at high speed', value: 25, unit: 'A', limit: 'maximum' }
			],
			tools: ['Scan tool', 'Digital multimeter', 'Inductive current clamp', 'Wiring diagram'],
			cautions: [
				'Electric fans can start without warning, even with the ignition off.',
				'Unplug the fan before working near the blades.'
			],
			serviceInfo: ['wiring diagram', 'diagnostic procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why must the cooling fan run whenever the A/C is on at idle?',
					options: [
						{ text: 'To charge the battery faster', correct: false },
						{
							text: 'The condenser needs airflow, otherwise high-side pressure climbs and cooling fails',
							correct: true
						},
						{ text: 'To keep the compressor clutch cool', correct: false }
					],
					explanation:
						'At idle there is no ram air, so the fan is the only airflow across the condenser.'
				},
				{
					prompt:
						'The fan runs when commanded with the scan tool but never switches on by itself. Where is the fault likely to be?',
					options: [
						{ text: 'In the fan motor', correct: false },
						{ text: 'In the fan relay contacts', correct: false },
						{
							text: 'In the inputs or control logic, such as the coolant temperature signal',
							correct: true
						}
					],
					explanation:
						'The command proves the motor, relay and wiring work, so the problem is in what makes the module decide to switch the fan on.'
				},
				{
					prompt: 'Why is the fan unplugged before working near its blades?',
					options: [
						{ text: 'It can start at any time, even with the ignition off', correct: true },
						{ text: 'To reset the fan module', correct: false },
						{ text: 'To stop the coolant from overheating', correct: false }
					],
					explanation:
						'Many fans run on after shut-down while the engine is hot, and they spin fast enough to injure.'
				}
			]
		},
		{
			code: 'HAC-11',
			title: 'Handle and store refrigerant lawfully',
			description:
				'Buy, store, move and dispose of refrigerant and cylinders as the law requires, never venting refrigerant, and keep the records the shop must hold.',
			tier: 1,
			requiredLevel: 4,
			minHours: 1,
			checklist: [
				{
					text: 'Holds, or works under someone holding, the certification required to handle refrigerant'
				},
				{
					text: 'Recovers all refrigerant and never releases it to the air',
					safety: true
				},
				{
					text: 'Uses only rated, in-date recovery cylinders, labelled and filled no higher than the limit',
					safety: true
				},
				{
					text: 'Stores cylinders upright and secured, away from heat and direct sun',
					safety: true
				},
				{ text: 'Keeps contaminated refrigerant in separate labelled cylinders for reclaim' },
				{
					text: 'Never refills a disposable cylinder and empties it fully before disposal',
					safety: true
				},
				{ text: 'Records refrigerant recovered, charged and sent for reclaim' }
			],
			specs: [
				{ label: 'Recovery cylinder fill level', value: 80, unit: '%', limit: 'maximum' },
				{ label: 'Cylinder storage temperature', value: 52, unit: '°C', limit: 'maximum' }
			],
			tools: [
				'Rated recovery cylinders',
				'Refrigerant scale',
				'Cylinder labels',
				'Cylinder rack or chain',
				'Refrigerant log'
			],
			cautions: [
				'Cylinders can burst if overheated or overfilled.',
				'Liquid refrigerant causes frostbite.',
				'Refrigerant is heavier than air and can displace oxygen in pits and low spaces.'
			],
			serviceInfo: ['safety data sheet', 'repair procedure'],
			questions: [
				{
					prompt: 'Why must a disposable refrigerant cylinder never be refilled?',
					options: [
						{ text: 'Its valve only works once, so it cannot be filled', correct: false },
						{ text: 'It is allowed if the cylinder is first purged with nitrogen', correct: false },
						{
							text: 'It is not built for reuse and can rupture',
							correct: true
						},
						{ text: 'It would hold too little to be worth filling', correct: false }
					],
					explanation:
						'Disposable cylinders are made for one fill, and refilling can weaken the shell or overfill it.'
				},
				{
					prompt: 'Why is a recovery cylinder never filled beyond its limit?',
					options: [
						{
							text: 'Liquid expands as it warms, and without vapour space the pressure can burst the cylinder',
							correct: true
						},
						{ text: 'The recovery machine cannot pump the last part', correct: false },
						{ text: 'The refrigerant would turn to oil', correct: false }
					],
					explanation:
						'A full cylinder of liquid has nowhere to expand, and a small temperature rise then raises pressure very sharply.'
				},
				{
					prompt: 'A refrigerant leak occurs while working in a pit. What is the main danger?',
					options: [
						{ text: 'The gas is corrosive to the pit walls', correct: false },
						{
							text: 'The gas collects low down and can displace the oxygen you breathe',
							correct: true
						},
						{ text: 'The gas rises and cannot reach the pit', correct: false }
					],
					explanation:
						'Being heavier than air, refrigerant settles in low spaces and can cause suffocation with little warning.'
				},
				{
					prompt: 'What is done with a charge that failed the purity test?',
					options: [
						{
							text: 'It is kept in a separate labelled cylinder and sent for reclaim or disposal',
							correct: true
						},
						{ text: 'It is mixed with clean refrigerant to dilute it', correct: false },
						{ text: 'It is vented outdoors', correct: false },
						{ text: 'It is charged back into the same vehicle', correct: false }
					],
					explanation:
						'Contaminated refrigerant must stay out of shop equipment and be handled by a reclaimer.'
				},
				{
					prompt: 'Which of these are lawful handling practices? Choose two.',
					options: [
						{ text: 'Keeping records of refrigerant recovered and charged', correct: true },
						{ text: 'Venting the small amount left in service hoses', correct: false },
						{ text: 'Storing cylinders in a closed vehicle in the sun', correct: false },
						{ text: 'Recovering all refrigerant before opening the system', correct: true }
					],
					explanation:
						'Recovery and record keeping are required, while venting any amount is unlawful and hot storage risks bursting a cylinder.'
				}
			]
		},
		{
			code: 'HAC-12',
			title: 'Replace an air conditioning component and restore system oil',
			description:
				'Replace a component such as a condenser, drier, accumulator or expansion valve after recovery, with new seals, the right oil and fittings torqued to specification.',
			tier: 3,
			requiredLevel: 2,
			minHours: 3,
			checklist: [
				{
					text: 'Recovers the refrigerant and records the oil removed',
					safety: true
				},
				{ text: 'Caps open lines and ports at once to keep out moisture and dirt' },
				{ text: 'Removes the component and measures the oil it contains' },
				{ text: 'Fits new seals of the correct material, lubricated with the system oil' },
				{ text: 'Adds oil as the service information directs for the new part' },
				{
					text: 'Tightens fittings to the specified torque',
					safety: true
				},
				{ text: 'Replaces the drier or accumulator when the procedure calls for it' },
				{
					text: 'Evacuates, recharges by weight and leak-tests',
					safety: true
				}
			],
			specs: [{ label: 'Block fitting bolt torque', value: 20, unit: 'N·m', limit: 'nominal' }],
			tools: [
				'Recovery, recycling and recharging machine',
				'Line caps and plugs',
				'Torque wrench',
				'Seal pick',
				'Correct compressor oil',
				'Eye protection and gloves'
			],
			cautions: [
				'Recover the refrigerant before opening any fitting.',
				'Wear eye protection: residual refrigerant and oil can spray when a fitting opens.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why are open lines capped straight away?',
					options: [
						{ text: 'To stop oil from draining out of the compressor', correct: false },
						{ text: 'To keep refrigerant pressure in the lines', correct: false },
						{ text: 'The oil and drier absorb moisture from the air', correct: true }
					],
					explanation:
						'Moisture forms acids and ice in the system, and the oils used absorb it quickly from humid air.'
				},
				{
					prompt: 'What should new seals be lubricated with before assembly?',
					options: [
						{ text: 'Engine oil', correct: false },
						{ text: 'Nothing; they must be fitted dry', correct: false },
						{ text: 'The same oil the system uses', correct: true },
						{ text: 'General-purpose grease', correct: false }
					],
					explanation:
						'System oil helps the seal seat without tearing, and other lubricants contaminate the refrigerant circuit.'
				}
			]
		}
	]
};
