import type { AreaDef } from '../../../framework/types';

export const area: AreaDef = {
	code: 'HVS',
	name: 'High-voltage and hybrid safety',
	tasks: [
		{
			code: 'HVS-01',
			title: 'Identify the high-voltage components and cabling on a hybrid or electric vehicle',
			description:
				'Confirm that a vehicle has a high-voltage system and locate its battery, power electronics, motors, cables, service disconnect and 12 V battery before any work begins.',
			tier: 1,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{
					text: 'Confirms from badges, the instrument cluster and service information that the vehicle is a hybrid or electric vehicle'
				},
				{
					text: 'Locates the high-voltage battery and its service disconnect using service information'
				},
				{
					text: 'Identifies the inverter, DC-DC converter, motor-generators and electric A/C compressor'
				},
				{
					text: 'Traces the orange high-voltage cables and notes their routing near the work area',
					safety: true
				},
				{ text: 'Locates the 12 V auxiliary battery and any remote jump-start terminals' },
				{
					text: 'Points out the high-voltage warning labels and explains which parts can stay charged after shutdown',
					safety: true
				}
			],
			specs: [
				{
					label: 'DC voltage above which a circuit is treated as high voltage',
					value: 60,
					unit: 'V',
					limit: 'minimum'
				},
				{ label: 'Typical hybrid battery pack voltage', value: 200, unit: 'V', limit: 'nominal' },
				{
					label: 'Typical electric vehicle battery pack voltage',
					value: 400,
					unit: 'V',
					limit: 'nominal'
				}
			],
			tools: ['Service information', 'Flashlight'],
			cautions: [
				'Do not touch, cut or pierce orange cables or components with high-voltage labels.',
				'A silent vehicle may be switched on and ready to move.'
			],
			serviceInfo: ['repair procedure', 'wiring diagram', 'owner information'],
			questions: [
				{
					prompt: 'What does orange insulation on a vehicle cable tell you?',
					options: [
						{ text: 'It is the 12 V battery positive cable', correct: false },
						{ text: 'It is a data network cable', correct: false },
						{
							text: 'It carries high voltage and must be treated as live until proven otherwise',
							correct: true
						},
						{ text: 'It is a heat-resistant cable near the exhaust', correct: false }
					],
					explanation: 'Orange is the trade convention for high-voltage cabling on road vehicles.'
				},
				{
					prompt:
						'The engine of a hybrid is silent and the cluster shows it is ready to drive. What is the state of the high-voltage system?',
					options: [
						{
							text: 'Fully energised; the vehicle can move without the engine starting',
							correct: true
						},
						{ text: 'Off, because the engine is not running', correct: false },
						{ text: 'Only the 12 V system is on', correct: false }
					],
					explanation:
						'On a hybrid the engine stops whenever it is not needed, so silence tells you nothing about whether high voltage is present.'
				},
				{
					prompt:
						'Which components may still hold a dangerous charge just after the system is switched off? (Choose two.)',
					options: [
						{ text: 'Capacitors inside the inverter', correct: true },
						{ text: 'The high-voltage battery modules themselves', correct: true },
						{ text: 'The washer fluid pump', correct: false },
						{ text: 'The 12 V fuse box lid', correct: false }
					],
					explanation:
						'Battery modules always hold their charge, and inverter capacitors stay charged until they discharge over several minutes.'
				},
				{
					prompt:
						'Why does an electric A/C compressor need the refrigerant oil specified by the vehicle maker?',
					options: [
						{ text: 'The wrong oil only reduces cooling slightly', correct: false },
						{ text: 'Any oil is fine if the amount is correct', correct: false },
						{
							text: 'Its motor windings sit in the refrigerant, so the oil must be electrically insulating; the wrong oil can cause an insulation fault',
							correct: true
						}
					],
					explanation:
						'Conductive oil lowers the insulation between the high-voltage motor and the housing, which the vehicle detects as a fault and which can shock a technician.'
				},
				{
					prompt:
						'Which is the best source for where the service disconnect is on a particular vehicle?',
					options: [
						{ text: 'The service information for that vehicle', correct: true },
						{ text: 'It is always under the rear seat', correct: false },
						{ text: 'A coworker who worked on a similar model', correct: false }
					],
					explanation:
						'Disconnect locations and procedures differ between vehicles, so only the vehicle-specific information is reliable.'
				}
			]
		},
		{
			code: 'HVS-02',
			title: 'Inspect and put on high-voltage insulating gloves and protective equipment',
			description:
				'Check insulating gloves for rating, test date and damage, air-test them, and wear them with leather protectors and the other protection needed for high-voltage work.',
			tier: 1,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{
					text: 'Checks the glove class label covers the system voltage and the test date is current',
					safety: true
				},
				{
					text: 'Inspects gloves inside and out for cuts, cracks, swelling, contamination and wear',
					safety: true
				},
				{
					text: 'Air-tests each glove by trapping air and rolling the cuff, listening and feeling for leaks',
					safety: true
				},
				{ text: 'Removes watches, rings and other metal items' },
				{ text: 'Puts on leather protectors over the insulating gloves' },
				{ text: 'Wears safety glasses, and a face shield where the procedure calls for it' },
				{ text: 'Selects insulated tools rated for the voltage and checks them for damage' },
				{ text: 'Stores gloves in their bag, away from sunlight, heat and sharp tools' }
			],
			specs: [
				{
					label: 'Class 0 glove maximum use voltage, AC',
					value: 1000,
					unit: 'V',
					limit: 'maximum'
				},
				{
					label: 'Class 0 glove maximum use voltage, DC',
					value: 1500,
					unit: 'V',
					limit: 'maximum'
				},
				{ label: 'Insulated hand tool rating', value: 1000, unit: 'V', limit: 'minimum' }
			],
			tools: [
				'Class 0 insulating gloves',
				'Leather protectors',
				'Face shield',
				'Insulated hand tools',
				'Glove bag'
			],
			cautions: [
				'A pinhole in a glove can let current through; test before every use.',
				'Never use gloves past their retest date or without leather protectors.'
			],
			serviceInfo: ['repair procedure', 'safety data sheet'],
			questions: [
				{
					prompt: 'Why are insulating gloves air-tested before every use?',
					options: [
						{ text: 'To dry out sweat from the last use', correct: false },
						{ text: 'To find pinholes and tears too small to see', correct: true },
						{ text: 'To stretch the rubber so the gloves fit better', correct: false }
					],
					explanation:
						'A tiny hole defeats the insulation, and trapped air escaping is the easiest way to find one.'
				},
				{
					prompt: 'Why are leather protectors worn over the rubber gloves?',
					options: [
						{ text: 'To add insulation so a lower class of glove can be used', correct: false },
						{ text: 'To keep the hands warm', correct: false },
						{
							text: 'To protect the rubber from cuts and punctures by sharp edges and tools',
							correct: true
						}
					],
					explanation:
						'The rubber provides the insulation; the leather keeps it from being damaged during the work.'
				},
				{
					prompt:
						'Which glove details must you check before work on a 400 V battery system? (Choose two.)',
					options: [
						{ text: 'That the electrical retest date has not passed', correct: true },
						{ text: 'That the glove colour matches the orange cables', correct: false },
						{ text: 'That the gloves are the thinnest available for dexterity', correct: false },
						{ text: 'That the class marked on the glove covers the system voltage', correct: true }
					],
					explanation:
						'A glove is only trusted within its voltage class and while its periodic electrical test is current.'
				},
				{
					prompt: 'You find a small crack near the cuff of one glove. What do you do?',
					options: [
						{ text: 'Use it if the crack is above the wrist', correct: false },
						{ text: 'Take the pair out of service and use another tested pair', correct: true },
						{ text: 'Tape over the crack and carry on', correct: false }
					],
					explanation:
						'Any damage means the insulation can no longer be relied on; repairs with tape are not acceptable.'
				},
				{
					prompt: 'Why remove rings and watches before high-voltage work?',
					options: [
						{ text: 'They can scratch the paint', correct: false },
						{ text: 'They interfere with the scan tool', correct: false },
						{
							text: 'Metal can bridge terminals, causing arcs and burns, and conducts current to your skin',
							correct: true
						}
					],
					explanation:
						'A ring across two terminals becomes a heating element and can cause severe burns even at lower voltages.'
				}
			]
		},
		{
			code: 'HVS-03',
			title: 'Disable the high-voltage system and verify the absence of voltage',
			description:
				'Follow the vehicle procedure to shut down and isolate the high-voltage system, wait for stored energy to discharge and prove with a rated meter that no voltage remains.',
			tier: 1,
			requiredLevel: 3,
			minHours: 4,
			checklist: [
				{ text: 'Looks up the vehicle-specific disabling procedure and the test points' },
				{
					text: 'Switches the vehicle off and moves the smart key well away from the vehicle',
					safety: true
				},
				{ text: 'Disconnects and isolates the 12 V battery negative cable', safety: true },
				{
					text: 'Wearing inspected insulating gloves, removes the service disconnect and keeps it under their control',
					safety: true
				},
				{ text: 'Waits the specified time for the inverter capacitors to discharge', safety: true },
				{ text: 'Checks the meter on a known live source', safety: true },
				{
					text: 'Measures at the specified terminals positive to negative and each to chassis, finding no voltage',
					safety: true
				},
				{
					text: 'Checks the meter again on the known source and records the results',
					safety: true
				},
				{ text: 'Tags the vehicle as high voltage disabled with their name' }
			],
			specs: [
				{ label: 'Meter voltage rating (CAT III)', value: 1000, unit: 'V', limit: 'minimum' },
				{
					label: 'Voltage at the test terminals to confirm absence',
					value: 1,
					unit: 'V',
					limit: 'maximum'
				}
			],
			tools: [
				'CAT III 1000 V multimeter',
				'Insulating gloves with leather protectors',
				'Proving unit or known voltage source',
				'Lock box for the service disconnect',
				'Warning tags'
			],
			cautions: [
				'High-voltage DC can stop the heart and cause deep burns.',
				'Removing the service disconnect does not discharge the inverter immediately.',
				'Treat every circuit as live until you have proven it dead.'
			],
			serviceInfo: ['repair procedure', 'wiring diagram'],
			questions: [
				{
					prompt:
						'Why must you wait after removing the service disconnect before touching high-voltage terminals?',
					options: [
						{
							text: 'Capacitors in the inverter hold a charge that takes minutes to drain',
							correct: true
						},
						{ text: 'The battery needs to cool down', correct: false },
						{ text: 'The vehicle computers need time to save their data', correct: false }
					],
					explanation:
						'Inverter capacitors can stay at pack voltage after isolation, so the specified wait lets them discharge before measuring.'
				},
				{
					prompt:
						'Why is the meter checked on a known live source both before and after measuring?',
					options: [
						{ text: 'To warm up the meter', correct: false },
						{
							text: 'To prove the meter and leads were working, so a zero reading really means no voltage',
							correct: true
						},
						{ text: 'To calibrate the meter to the vehicle battery', correct: false }
					],
					explanation:
						'A blown fuse or broken lead reads zero too; checking before and after rules that out.'
				},
				{
					prompt:
						'Which measurements confirm absence of voltage at a pair of high-voltage terminals? (Choose two.)',
					options: [
						{ text: 'The 12 V battery posts only', correct: false },
						{ text: 'Resistance between the terminals', correct: false },
						{ text: 'Positive terminal to negative terminal', correct: true },
						{ text: 'Each terminal to vehicle chassis', correct: true }
					],
					explanation:
						'Checking across the terminals and from each to chassis catches a charged circuit and an insulation fault to the body.'
				},
				{
					prompt: 'What should you do with the removed service disconnect?',
					options: [
						{
							text: 'Keep it in your possession or a locked box so nobody can refit it while you work',
							correct: true
						},
						{ text: 'Leave it on the seat so the next technician can find it', correct: false },
						{ text: 'Refit it loosely so it cannot be lost', correct: false }
					],
					explanation:
						'Controlling the disconnect is your lockout; nobody can re-energise the system without it.'
				},
				{
					prompt: 'Why is the smart key moved well away from the vehicle?',
					options: [
						{ text: 'So the alarm does not sound', correct: false },
						{
							text: 'So the vehicle cannot be switched on, closing the battery relays, while you work',
							correct: true
						},
						{ text: 'To save the key battery', correct: false }
					],
					explanation:
						'With the key in range a press of the start button can power up the system and reconnect the battery.'
				}
			]
		},
		{
			code: 'HVS-04',
			title: 'Test and replace the 12 V auxiliary battery on a hybrid or electric vehicle',
			description:
				'Locate, test and replace the 12 V battery that powers the control systems of a high-voltage vehicle, including its vent tube and any relearns.',
			tier: 1,
			requiredLevel: 3,
			minHours: 1.5,
			checklist: [
				{ text: 'Locates the 12 V battery and its remote jump terminals from service information' },
				{
					text: 'Switches the vehicle off with the key away and checks the battery voltage and condition'
				},
				{ text: 'Disconnects the negative cable first and the positive second', safety: true },
				{
					text: 'Fits a replacement of the same type and size, including the vent tube where fitted',
					safety: true
				},
				{
					text: 'Connects the positive cable first and the negative last, torqued to specification',
					safety: true
				},
				{ text: 'Secures the hold-down' },
				{
					text: 'Switches on to ready, checks for warnings and completes any window or sensor relearn'
				}
			],
			specs: [
				{ label: 'Fully charged battery at rest', value: 12.6, unit: 'V', limit: 'nominal' },
				{
					label: 'Battery at rest before load or conductance testing',
					value: 12.4,
					unit: 'V',
					limit: 'minimum'
				},
				{ label: 'Battery terminal clamp nut torque', value: 6, unit: 'N·m', limit: 'nominal' },
				{
					label: 'Charger voltage for an absorbent glass mat battery',
					value: 14.4,
					unit: 'V',
					limit: 'maximum'
				}
			],
			tools: [
				'Battery conductance tester',
				'Multimeter',
				'Battery charger with AGM setting',
				'Terminal brush'
			],
			cautions: [
				'A battery mounted inside the cabin or trunk must keep its vent tube so gases go outside.',
				'Do not touch high-voltage parts or cables near the 12 V battery.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'owner information'],
			questions: [
				{
					prompt:
						'The high-voltage battery is charged but the vehicle will not switch on to ready. Why might the 12 V battery be the cause?',
					options: [
						{
							text: 'The 12 V battery charges the high-voltage battery at start-up',
							correct: false
						},
						{ text: 'The 12 V battery is not used on hybrids', correct: false },
						{
							text: 'The 12 V battery powers the control modules and the relays that connect the high-voltage battery',
							correct: true
						}
					],
					explanation:
						'Without 12 V the computers cannot wake up and close the main relays, so a flat 12 V battery stops the whole vehicle.'
				},
				{
					prompt: 'Why must a replacement battery in the cabin have its vent tube fitted?',
					options: [
						{
							text: 'So hydrogen and acid vapour are vented outside the passenger area',
							correct: true
						},
						{ text: 'So the battery stays cool', correct: false },
						{ text: 'So water can be added later', correct: false }
					],
					explanation:
						'Battery gases are explosive and corrosive and must not build up inside the vehicle.'
				},
				{
					prompt: 'Why is the negative cable disconnected first?',
					options: [
						{ text: 'It stops the high-voltage battery from discharging', correct: false },
						{
							text: 'If the wrench touches the body while loosening the negative, nothing happens; on the positive it would short',
							correct: true
						},
						{ text: 'The negative terminal is always easier to reach', correct: false }
					],
					explanation:
						'With the ground side disconnected first, a wrench touching metal cannot complete a short circuit.'
				},
				{
					prompt: 'Which battery should replace an original absorbent glass mat battery?',
					options: [
						{ text: 'Any flooded battery of the same size, because it is cheaper', correct: false },
						{ text: 'The largest battery that fits the tray', correct: false },
						{ text: 'A battery of the same type, size and rating', correct: true }
					],
					explanation:
						'Charging strategy, venting and mounting are designed for the original type, so a different type may be damaged or unsafe.'
				},
				{
					prompt: 'Another vehicle needs a boost. Can a hybrid be used to jump it?',
					options: [
						{
							text: 'Only if the owner information allows it; many systems can be damaged by boosting another vehicle',
							correct: true
						},
						{
							text: 'Yes, always; the high-voltage battery gives plenty of current',
							correct: false
						},
						{ text: 'Yes, by connecting to the orange cables', correct: false }
					],
					explanation:
						'The small 12 V battery and converter are not built to crank another engine, and high-voltage cables must never be used.'
				}
			]
		},
		{
			code: 'HVS-05',
			title: 'Inspect and use electric vehicle charging equipment in the shop',
			description:
				'Inspect charging cords and stations, connect and disconnect a vehicle correctly and keep charging away from vehicles under repair.',
			tier: 2,
			requiredLevel: 3,
			minHours: 1,
			checklist: [
				{
					text: 'Inspects the cable, connector, plug and station for cuts, heat marks and damaged pins',
					safety: true
				},
				{
					text: 'Uses a suitable dedicated outlet and no household extension cord or unapproved adapter',
					safety: true
				},
				{
					text: 'Connects to the vehicle and confirms charging has started on the vehicle or station display'
				},
				{ text: 'Stops the session from the vehicle or station before unplugging' },
				{ text: 'Routes and stows the cable so it is not a trip hazard or driven over' }
			],
			specs: [
				{ label: 'Typical Level 2 AC supply voltage', value: 240, unit: 'V', limit: 'nominal' },
				{ label: 'Typical Level 1 portable cord current', value: 12, unit: 'A', limit: 'maximum' }
			],
			tools: ['Portable charging cord', 'Wall-mounted charging station'],
			cautions: [
				'Never charge a vehicle with a damaged high-voltage battery or while high-voltage work is in progress.',
				'A damaged cable or connector can give a shock; take it out of service.'
			],
			serviceInfo: ['owner information', 'repair procedure'],
			questions: [
				{
					prompt: 'Why must a household extension cord not be used with a portable charging cord?',
					options: [
						{ text: 'It is fine if it is unrolled', correct: false },
						{
							text: 'It may not carry the continuous current, so it can overheat and cause a fire',
							correct: true
						},
						{ text: 'The vehicle refuses to charge through it', correct: false }
					],
					explanation:
						'Charging draws high current for hours, more than many household cords and plugs can handle without heating.'
				},
				{
					prompt: 'Why is the session stopped before the connector is pulled out?',
					options: [
						{ text: 'It lets the battery cool down', correct: false },
						{ text: 'It resets the charge timer', correct: false },
						{
							text: 'Breaking the circuit under load can arc and damage the pins; stopping first ends the current flow',
							correct: true
						}
					],
					explanation:
						'Stopping the session lets the station switch off the current before the contacts separate.'
				}
			]
		},
		{
			code: 'HVS-06',
			title: 'Respond to an electric shock or a high-voltage battery fire',
			description:
				'Rescue a coworker from contact with high voltage without becoming a second casualty, and respond correctly to smoke or fire from a high-voltage battery.',
			tier: 1,
			requiredLevel: 3,
			minHours: 1,
			checklist: [
				{ text: 'Raises the alarm and calls emergency services', safety: true },
				{
					text: 'Does not touch the casualty directly while they may still be in contact with the circuit',
					safety: true
				},
				{
					text: 'Uses the insulated rescue hook or a dry non-conductive object to pull the casualty clear',
					safety: true
				},
				{
					text: 'Starts first aid and uses the defibrillator if trained and if needed',
					safety: true
				},
				{
					text: 'For battery smoke or fire, evacuates the area and stays upwind of the fumes',
					safety: true
				},
				{
					text: 'Tells responders it is a high-voltage battery and where it is, and gives them the vehicle emergency information',
					safety: true
				},
				{
					text: 'Keeps a damaged vehicle isolated outdoors afterwards, clear of buildings and other vehicles'
				}
			],
			specs: [],
			tools: [
				'Insulated rescue hook',
				'Defibrillator',
				'First-aid kit',
				'Emergency response information for the vehicle'
			],
			cautions: [
				'Touching someone in contact with high voltage can kill you too.',
				'Battery fire smoke is toxic, and a battery can re-ignite hours or days later.'
			],
			serviceInfo: ['repair procedure', 'owner information'],
			questions: [
				{
					prompt:
						'A coworker is in contact with a high-voltage cable and cannot let go. What do you do first?',
					options: [
						{
							text: 'Without touching them, pull them clear with the insulated rescue hook and call for help',
							correct: true
						},
						{ text: 'Grab their arm and pull hard', correct: false },
						{ text: 'Pour water on the cable', correct: false },
						{ text: 'Run to find the service disconnect in service information', correct: false }
					],
					explanation:
						'Current can pass through the casualty into you, so you must separate them using something insulated.'
				},
				{
					prompt: 'Why does a shock casualty need medical checking even if they seem fine?',
					options: [
						{ text: 'Only if they are unconscious', correct: false },
						{
							text: 'Current through the body can disturb the heart rhythm and cause internal burns that are not visible',
							correct: true
						},
						{ text: 'It is only needed for insurance', correct: false }
					],
					explanation: 'Effects of electric shock on the heart and tissues can appear later.'
				},
				{
					prompt:
						'A high-voltage battery starts hissing and giving off smoke in the bay. What should you do? (Choose two.)',
					options: [
						{ text: 'Open the battery case to find the damaged cell', correct: false },
						{ text: 'Drive the vehicle outside yourself', correct: false },
						{ text: 'Get everyone out and call the fire service', correct: true },
						{ text: 'Tell the responders it is a high-voltage lithium-ion battery', correct: true }
					],
					explanation:
						'Cell venting can turn into a fierce, toxic fire within moments, and responders need to know it is a traction battery.'
				},
				{
					prompt:
						'Why is a damaged high-voltage vehicle parked outdoors and away from buildings after an incident?',
					options: [
						{
							text: 'Damaged cells can heat up and catch fire again long after the first event',
							correct: true
						},
						{ text: 'So the battery can cool faster in the wind', correct: false },
						{ text: 'It is easier for the tow truck to collect', correct: false }
					],
					explanation:
						'Delayed re-ignition is a known hazard of damaged lithium-ion batteries, so they are kept where a fire cannot spread.'
				},
				{
					prompt: 'Where should the insulated rescue hook be kept during high-voltage work?',
					options: [
						{ text: 'Inside the vehicle being repaired', correct: false },
						{
							text: 'At the edge of the marked work area, in plain sight and easy reach',
							correct: true
						},
						{ text: 'In the tool room so it is not damaged', correct: false }
					],
					explanation:
						'In an emergency there are only seconds to act, so the hook must be at hand, not locked away.'
				}
			]
		},
		{
			code: 'HVS-07',
			title: 'Set up and control a high-voltage work area',
			description:
				'Mark off a vehicle under high-voltage work with barriers and signs, keep rescue equipment ready and control who can enter and who holds the lockout.',
			tier: 2,
			requiredLevel: 3,
			minHours: 1,
			checklist: [
				{ text: 'Places barriers and high-voltage warning signs around the vehicle', safety: true },
				{
					text: 'Places the rescue hook and insulating mat at the edge of the work area',
					safety: true
				},
				{
					text: 'Locks the service disconnect and keys away and tags the vehicle with their name',
					safety: true
				},
				{ text: 'Briefs coworkers on the work and who is responsible' },
				{ text: 'Keeps the area clear of unneeded tools, fluids and unauthorised people' }
			],
			specs: [],
			tools: [
				'Barrier posts and chain or tape',
				'High-voltage warning signs',
				'Rescue hook',
				'Insulating mat',
				'Lock box and tags'
			],
			cautions: ['An untrained person entering the area can touch exposed high-voltage parts.'],
			serviceInfo: ['repair procedure'],
			questions: [
				{
					prompt:
						'Why does the technician doing the work hold the lock for the service disconnect?',
					options: [
						{ text: 'So the shop manager does not lose it', correct: false },
						{ text: 'It is needed to start the vehicle', correct: false },
						{
							text: 'So only they can decide when the system is safe to re-energise',
							correct: true
						}
					],
					explanation:
						'Personal control of the lockout stops someone else reconnecting high voltage while you are still working.'
				},
				{
					prompt: 'What is the main purpose of barriers and signs around the vehicle?',
					options: [
						{
							text: 'To stop untrained people entering and touching high-voltage parts',
							correct: true
						},
						{ text: 'To reserve the bay for the next job', correct: false },
						{ text: 'To keep customers from seeing the repair', correct: false }
					],
					explanation:
						'Only trained and protected people should be near exposed high-voltage components.'
				}
			]
		},
		{
			code: 'HVS-08',
			title: 'Test high-voltage insulation resistance with an insulation tester',
			description:
				'On an isolated and proven-dead high-voltage component or cable, apply the specified test voltage with an insulation tester and compare the result with service information.',
			tier: 3,
			requiredLevel: 2,
			minHours: 2,
			checklist: [
				{ text: 'Confirms the system has been disabled and proven dead', safety: true },
				{ text: 'Looks up the test points, test voltage and minimum insulation resistance' },
				{
					text: 'Wears insulating gloves and connects the tester between the conductor and chassis'
				},
				{ text: 'Applies the test voltage for the specified time and records the reading' },
				{
					text: 'Lets the tester discharge the circuit before disconnecting the leads',
					safety: true
				},
				{ text: 'Compares the result with specification and reports an insulation fault' }
			],
			specs: [
				{ label: 'Typical insulation test voltage', value: 500, unit: 'V', limit: 'nominal' }
			],
			tools: [
				'Insulation resistance tester',
				'Insulating gloves with leather protectors',
				'CAT III 1000 V multimeter'
			],
			cautions: [
				'The tester itself produces a dangerous voltage; do not touch the leads during the test.',
				'Never connect the tester to an energised circuit.'
			],
			serviceInfo: ['diagnostic procedure', 'specifications', 'wiring diagram'],
			questions: [
				{
					prompt: 'Why must the circuit be disabled and proven dead before an insulation test?',
					options: [
						{ text: 'It saves the tester battery', correct: false },
						{
							text: 'The tester applies its own high voltage and must not be connected to a live system',
							correct: true
						},
						{ text: 'The reading is only stored when the vehicle is off', correct: false }
					],
					explanation:
						'Connecting to a live circuit can damage the tester and expose you to system voltage as well as the test voltage.'
				},
				{
					prompt: 'Why do you let the tester discharge the circuit before removing the leads?',
					options: [
						{ text: 'To save the reading in memory', correct: false },
						{ text: 'It is not necessary', correct: false },
						{ text: 'The cable stores some of the test voltage and can shock you', correct: true }
					],
					explanation:
						'A long cable acts as a capacitor during the test and holds a charge until it is discharged.'
				}
			]
		},
		{
			code: 'HVS-09',
			title: 'Restore the high-voltage system after service and confirm normal operation',
			description:
				'Check that all high-voltage connections and covers are secure, refit the service disconnect and 12 V battery, and confirm the vehicle reaches ready with no faults.',
			tier: 1,
			requiredLevel: 3,
			minHours: 1,
			checklist: [
				{
					text: 'Counts tools and checks nothing is left in the battery, inverter or motor compartments',
					safety: true
				},
				{ text: 'Torques high-voltage terminal fasteners to specification', safety: true },
				{
					text: 'Confirms every high-voltage connector is latched and every cover is fitted',
					safety: true
				},
				{ text: 'Wearing insulating gloves, refits the service disconnect', safety: true },
				{ text: 'Reconnects the 12 V battery negative cable' },
				{
					text: 'Switches on to ready and checks for warning lamps and trouble codes, including insulation faults'
				},
				{
					text: 'Removes barriers and tags only after the system checks correct and records the work'
				}
			],
			specs: [
				{
					label: 'High-voltage terminal bolt torque (typical M6)',
					value: 8,
					unit: 'N·m',
					limit: 'nominal'
				}
			],
			tools: ['Insulating gloves with leather protectors', 'Insulated torque wrench', 'Scan tool'],
			cautions: [
				'A loose high-voltage terminal can overheat, arc and start a fire.',
				'Re-energising with a tool inside a compartment can cause a short circuit.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'diagnostic procedure'],
			questions: [
				{
					prompt:
						'Why are high-voltage terminal bolts torqued to specification rather than snugged by feel?',
					options: [
						{
							text: 'Too loose causes heat and arcing under high current; too tight can crack terminals or studs',
							correct: true
						},
						{ text: 'Torque only matters for appearance', correct: false },
						{ text: 'Only to pass the insulation test', correct: false }
					],
					explanation:
						'High-voltage connections carry large currents, so clamp force decides whether they stay cool and secure.'
				},
				{
					prompt:
						'The vehicle will not reach ready after reassembly and shows an interlock fault. What is the likely cause?',
					options: [
						{ text: 'The cabin air filter is missing', correct: false },
						{ text: 'A high-voltage connector or cover is not fully latched', correct: true },
						{ text: 'The 12 V battery is fully charged', correct: false }
					],
					explanation:
						'An interlock circuit runs through high-voltage connectors and covers and keeps the main relays open if any one is open.'
				},
				{
					prompt: 'Why count tools before refitting the service disconnect?',
					options: [
						{ text: 'To check none were stolen', correct: false },
						{ text: 'To bill the customer for tool use', correct: false },
						{
							text: 'A tool left across terminals or in a compartment can cause a short circuit when power returns',
							correct: true
						}
					],
					explanation:
						'Accounting for every tool is the simplest way to make sure none is left inside.'
				},
				{
					prompt: 'Which checks confirm a good result after re-energising? (Choose two.)',
					options: [
						{ text: 'The vehicle reaches ready with no warning lamps', correct: true },
						{
							text: 'A scan shows no stored high-voltage or insulation trouble codes',
							correct: true
						},
						{ text: 'The engine runs continuously at idle', correct: false },
						{ text: 'The orange cables feel warm', correct: false }
					],
					explanation:
						'The vehicle monitors its high-voltage system, so a clean start and a clean scan show it sees no fault.'
				},
				{
					prompt: 'When may the barriers and tags be removed?',
					options: [
						{ text: 'At the start of the job, once the vehicle is on the lift', correct: false },
						{
							text: 'After every component is refitted, the system is restored and it checks correct',
							correct: true
						},
						{ text: 'As soon as the service disconnect is back in', correct: false }
					],
					explanation:
						'The work area stays controlled until the vehicle is back to a safe, finished state.'
				}
			]
		},
		{
			code: 'HVS-10',
			title: 'Handle and store a removed or damaged high-voltage battery',
			description:
				'Recognise signs of a damaged traction battery, isolate and store it safely, and prepare it for transport by a trained shipper.',
			tier: 3,
			requiredLevel: 1,
			minHours: 1,
			checklist: [
				{ text: 'Checks the battery for swelling, leaks, odour, hissing or heat', safety: true },
				{
					text: 'Covers exposed terminals and places the battery on a non-conductive, stable stand'
				},
				{
					text: 'Stores it in a designated area away from buildings, flammables and other vehicles',
					safety: true
				},
				{ text: 'Labels it with its condition and the date' },
				{ text: 'Arranges transport through someone trained for dangerous goods shipping' }
			],
			specs: [],
			tools: ['Battery lift table', 'Insulating gloves', 'Terminal covers', 'Infrared thermometer'],
			cautions: [
				'Traction batteries are very heavy; use the lift table, never lift by hand.',
				'Leaking electrolyte is corrosive and flammable.'
			],
			serviceInfo: ['repair procedure', 'safety data sheet'],
			questions: [
				{
					prompt:
						'Which signs suggest a traction battery is damaged and may go into thermal runaway? (Choose two.)',
					options: [
						{ text: 'Dust on the case', correct: false },
						{ text: 'A faded label', correct: false },
						{ text: 'Swelling of the case or a sweet or solvent smell', correct: true },
						{ text: 'Heat, hissing or popping sounds', correct: true }
					],
					explanation:
						'Swelling, odour, heat and venting noises show cells are failing and the battery must be isolated.'
				},
				{
					prompt:
						'Why must a removed traction battery be shipped by someone trained for dangerous goods?',
					options: [
						{
							text: 'Lithium-ion batteries are regulated dangerous goods with packaging and labelling rules',
							correct: true
						},
						{ text: 'Only because of their weight', correct: false },
						{ text: 'Any courier can take them', correct: false }
					],
					explanation:
						'Incorrectly packed lithium batteries can catch fire in transit, so shipping is controlled by law.'
				}
			]
		},
		{
			code: 'HVS-11',
			title: 'Drain, refill and bleed the battery and inverter cooling circuit',
			description:
				'Service the separate coolant circuit that cools the high-voltage battery or power electronics with the specified coolant, and bleed it with the scan-tool routine.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{ text: 'Looks up the circuit, the coolant type and the bleed procedure' },
				{ text: 'Confirms the system is cold and the vehicle is switched off' },
				{ text: 'Drains the circuit without disturbing high-voltage connectors', safety: true },
				{ text: 'Refills with the specified coolant only' },
				{
					text: 'Runs the electric pump with the scan-tool bleed routine and tops up until free of air'
				},
				{ text: 'Checks for leaks and sets the level at the cold mark' }
			],
			specs: [
				{
					label: 'Typical inverter cooling circuit capacity',
					value: 2.5,
					unit: 'L',
					limit: 'nominal'
				}
			],
			tools: ['Scan tool', 'Coolant funnel with spill-free adapter', 'Drain pan'],
			cautions: [
				'Hot coolant under pressure can scald; work on a cold system.',
				'Keep coolant away from high-voltage connectors.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'maintenance schedule'],
			questions: [
				{
					prompt:
						'Why is the coolant for a battery cooling circuit not swapped for the engine coolant on the shelf?',
					options: [
						{ text: 'Any coolant is fine if it is the same colour', correct: false },
						{
							text: 'The circuit may need a specific coolant, for example of low electrical conductivity, to protect the high-voltage parts',
							correct: true
						},
						{ text: 'Engine coolant is too thick to pump', correct: false }
					],
					explanation:
						'The coolant flows through plates next to high-voltage components, so its chemistry is specified for that job.'
				},
				{
					prompt: 'Why is the electric pump run with the scan tool during bleeding?',
					options: [
						{ text: 'To charge the high-voltage battery', correct: false },
						{ text: 'To heat the coolant to operating temperature', correct: false },
						{
							text: 'The circuit has no engine-driven pump, so the routine moves air out of it',
							correct: true
						}
					],
					explanation:
						'Air pockets reduce cooling of the battery and inverter, and the electric pump is the only way to circulate the coolant while servicing.'
				}
			]
		},
		{
			code: 'HVS-12',
			title: 'Move, lift and tow a hybrid or electric vehicle safely',
			description:
				'Drive and park a high-voltage vehicle in the shop, lift it without touching the battery pack and arrange towing that does not turn the drive motors.',
			tier: 2,
			requiredLevel: 3,
			minHours: 1,
			checklist: [
				{
					text: 'Switches off the ready mode, selects park and takes the key away after moving the vehicle',
					safety: true
				},
				{ text: 'Checks the lift capacity covers the vehicle weight' },
				{
					text: 'Places lift pads only at the specified lift points, clear of the battery pack and cables',
					safety: true
				},
				{
					text: 'Arranges towing with the drive wheels off the ground or on a flatbed',
					safety: true
				},
				{ text: 'Records in the repair order that the vehicle is a high-voltage vehicle' }
			],
			specs: [],
			tools: ['Two-post lift', 'Lift pad adapters', 'Wheel dollies'],
			cautions: [
				'A vehicle in ready mode moves silently when a gear is selected.',
				'Lift pads on the battery case can crush cells and start a fire.'
			],
			serviceInfo: ['owner information', 'repair procedure'],
			questions: [
				{
					prompt:
						'Why should an electric vehicle not be towed with its drive wheels turning on the road?',
					options: [
						{
							text: 'The turning motors act as generators and can produce voltage and overheat components',
							correct: true
						},
						{ text: 'The tyres wear faster', correct: false },
						{ text: 'The parking brake cannot be released', correct: false }
					],
					explanation:
						'A spinning motor generates voltage into the inverter even with the vehicle off, which can damage it.'
				},
				{
					prompt: 'Why must lift pads stay clear of the battery pack?',
					options: [
						{ text: 'It is only to protect the underbody covers', correct: false },
						{
							text: 'The pack is not a lift point; point loads can damage cells and cause a fire later',
							correct: true
						},
						{ text: 'The pack is too slippery', correct: false }
					],
					explanation:
						'Crushed cells may short internally and ignite hours afterwards, so only the specified lift points are used.'
				}
			]
		}
	]
};
