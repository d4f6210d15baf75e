import type { AreaDef } from '../../../framework/types';

export const area: AreaDef = {
	code: 'SAF',
	name: 'Shop safety and tools',
	tasks: [
		{
			code: 'SAF-01',
			title: 'Raise and lower a vehicle on a two-post lift',
			description:
				'Position a vehicle on a two-post lift at the specified lift points, raise it to working height on the mechanical locks and lower it again with the area clear.',
			tier: 1,
			requiredLevel: 4,
			minHours: 4,
			checklist: [
				{
					text: 'Confirms the lift is in service, its rated capacity suits the vehicle, and the bay floor and overhead space are clear',
					safety: true
				},
				{ text: 'Looks up the lift points for this vehicle in service information', safety: true },
				{
					text: 'Drives or pushes the vehicle in so its centre of gravity sits between the columns, then sets the arms, pads and any height adapters on the lift points with the arm restraints engaged',
					safety: true
				},
				{
					text: 'Raises until the tyres just leave the floor, stops, and checks that every pad is in full contact and the vehicle is stable',
					safety: true
				},
				{
					text: 'Raises to working height and lowers onto the mechanical locks on both columns before going underneath',
					safety: true
				},
				{
					text: 'Re-checks support and stability before removing heavy components, and adds supplementary stands where the centre of gravity will shift',
					safety: true
				},
				{
					text: 'Before lowering, removes tools, stands and drain pans from under the vehicle and makes sure nobody is in the bay',
					safety: true
				},
				{
					text: 'Raises slightly off the locks, releases both locks and lowers in full view, then swings the arms clear before the vehicle is moved'
				}
			],
			specs: [
				{
					label: 'Tyre clearance above the floor at the stability check',
					value: 100,
					unit: 'mm',
					limit: 'maximum'
				}
			],
			tools: ['Two-post lift', 'Lift pad height adapters', 'Supplementary tall support stands'],
			cautions: [
				'A vehicle that slips off the pads can kill; never go under it until it rests on the locks.',
				'Removing an engine, transmission or axle moves the centre of gravity and can tip the vehicle.',
				'Keep hands and feet clear of arms and carriages while lowering.'
			],
			serviceInfo: ['repair procedure', 'owner information'],
			questions: [
				{
					prompt: 'Why do you stop the lift when the tyres have only just left the floor?',
					options: [
						{
							text: 'To let the suspension settle so wheel alignment readings are accurate',
							correct: false
						},
						{ text: 'Because the lift locks only engage at that height', correct: false },
						{
							text: 'To check that all pads are in full contact and the vehicle is stable before it is high enough to cause serious harm if it shifts',
							correct: true
						},
						{ text: 'To let the hydraulic fluid warm up before the full lift', correct: false }
					],
					explanation:
						'A poorly placed pad shows up as soon as the weight comes on it, and it is far safer to correct it a few centimetres off the ground than at full height.'
				},
				{
					prompt: 'Where should you place the lift pads?',
					options: [
						{ text: 'Under the rocker panel trim, where they are easiest to see', correct: false },
						{
							text: 'On the lift points shown in the service information for that vehicle',
							correct: true
						},
						{ text: 'On any flat part of the floor pan near each wheel', correct: false },
						{
							text: 'Under the suspension arms, because they carry the weight of the vehicle',
							correct: false
						}
					],
					explanation:
						'Lift points are reinforced to carry the vehicle; other places can crush, slip or puncture fuel lines, battery packs or body panels.'
				},
				{
					prompt:
						'You will remove a transmission with the vehicle on the lift. What should you do? (Choose two.)',
					options: [
						{
							text: 'Consider how the centre of gravity will move and reposition the vehicle or pads if needed before starting',
							correct: true
						},
						{
							text: 'Place supplementary support stands at the end that will become lighter or heavier, as service information directs',
							correct: true
						},
						{
							text: 'Lower the vehicle off the locks so the hydraulics can take up the shift',
							correct: false
						},
						{ text: 'Nothing extra; the arm restraints keep the vehicle balanced', correct: false }
					],
					explanation:
						'Taking a heavy component out of one end unbalances the vehicle on the pads, so the shift is planned for and the vehicle is given extra support.'
				},
				{
					prompt:
						'Why is the vehicle lowered onto the mechanical locks before anyone works underneath?',
					options: [
						{ text: 'It stops the lift motor from overheating', correct: false },
						{ text: 'The locks level the vehicle so fluids drain completely', correct: false },
						{
							text: 'Hydraulic seals, hoses or valves can fail and let the lift drift down; the locks hold the load mechanically',
							correct: true
						}
					],
					explanation:
						'Relying on hydraulic pressure alone leaves a person under the vehicle exposed to a sudden loss of pressure.'
				},
				{
					prompt: 'What is the correct order when lowering the lift?',
					options: [
						{
							text: 'Clear tools, stands and people; raise slightly off the locks; release both locks; lower in full view',
							correct: true
						},
						{
							text: 'Release the locks; lower; remove the drain pan and stands once the wheels touch',
							correct: false
						},
						{
							text: 'Lower onto the stands first so the locks release by themselves',
							correct: false
						}
					],
					explanation:
						'The locks can only be released once their weight is taken off them, and anything left underneath can be crushed or can damage the vehicle.'
				},
				{
					prompt: 'Only one column lock engages when you lower onto the locks. What do you do?',
					options: [
						{ text: 'Put a jack under the other side and carry on working', correct: false },
						{
							text: 'Stop, raise the lift, keep everyone out from underneath and have the lift checked before using it',
							correct: true
						},
						{ text: 'Carry on; one lock holds the weight of most cars', correct: false }
					],
					explanation:
						'A lift that does not lock on both columns is unsafe and must be taken out of service until it has been inspected.'
				}
			]
		},
		{
			code: 'SAF-02',
			title: 'Raise a vehicle with a floor jack and support it on jack stands',
			description:
				'Lift one end or corner of a vehicle with a floor jack at the specified jacking point and transfer the load to correctly rated jack stands before working underneath.',
			tier: 1,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{
					text: 'Parks on a level, hard floor, selects park or a gear, applies the parking brake and chocks the wheels on the axle staying on the ground',
					safety: true
				},
				{ text: 'Checks the rating and condition of the jack and a matched pair of stands' },
				{
					text: 'Finds the jacking points and stand positions in service information',
					safety: true
				},
				{
					text: 'Centres the jack saddle on the jacking point and raises the vehicle smoothly, watching for movement'
				},
				{
					text: 'Sets both stands at the same height with their locking pins or pawls fully engaged, at the specified support points',
					safety: true
				},
				{
					text: 'Lowers the vehicle slowly onto the stands and checks it is stable before going underneath',
					safety: true
				},
				{
					text: 'To lower, raises the vehicle off the stands, removes them and everything from underneath, then lowers slowly',
					safety: true
				}
			],
			specs: [],
			tools: ['Floor jack', 'Jack stands (matched pair)', 'Wheel chocks', 'Jack saddle pad'],
			cautions: [
				'Never work under a vehicle held only by a jack.',
				'Bricks, wood blocks or wheels are not substitutes for rated stands.',
				'Keep feet clear of the jack handle and the stand bases while lowering.'
			],
			serviceInfo: ['repair procedure', 'owner information'],
			questions: [
				{
					prompt:
						'Why must the vehicle rest on stands rather than the jack before you go underneath?',
					options: [
						{ text: 'The jack will overheat if it holds a load for too long', correct: false },
						{ text: 'Stands raise the vehicle higher than the jack can', correct: false },
						{
							text: 'A hydraulic jack can leak down or roll; a stand holds the load mechanically',
							correct: true
						}
					],
					explanation:
						'Jacks are for lifting only; their seals and wheels make them unsuitable to hold a load over a person.'
				},
				{
					prompt: 'You are raising the front of the car. Where do the wheel chocks go?',
					options: [
						{ text: 'Front and back of the rear wheels that stay on the ground', correct: true },
						{ text: 'Behind the front wheels only', correct: false },
						{ text: 'No chocks are needed if the parking brake is on', correct: false }
					],
					explanation:
						'Chocking the wheels that remain on the floor stops the vehicle rolling off the jack or stands, and many parking brakes act only on the rear wheels.'
				},
				{
					prompt: 'Which of these are good practice when placing jack stands? (Choose two.)',
					options: [
						{ text: 'Place them under the oil pan so the engine takes the weight', correct: false },
						{
							text: 'Use the highest setting so there is more working room, whatever the floor',
							correct: false
						},
						{
							text: 'Set both stands to the same height with the locks fully engaged',
							correct: true
						},
						{
							text: 'Place them on the support points given in service information, on a hard level surface',
							correct: true
						}
					],
					explanation:
						'Matched height and correct support points keep the load even and stop the vehicle rocking or sliding off a stand.'
				},
				{
					prompt:
						'After lowering the vehicle onto the stands, what do you check before going underneath?',
					options: [
						{ text: 'That the tyre pressures are correct', correct: false },
						{ text: 'That the jack is fully lowered and pushed away', correct: false },
						{
							text: 'That the vehicle sits squarely and does not move when pushed firmly at the end of the vehicle',
							correct: true
						}
					],
					explanation:
						'A firm push shows an unstable stand while nobody is underneath; many shops also leave the jack lightly raised nearby as a back-up.'
				},
				{
					prompt:
						'The floor where the customer car is parked slopes slightly and is gravel. What should you do?',
					options: [
						{
							text: 'Move the vehicle to a level, hard surface before jacking it',
							correct: true
						},
						{ text: 'Jack it where it is but use extra chocks', correct: false },
						{ text: 'Put plywood under the stands and work as normal', correct: false }
					],
					explanation:
						'Jacks roll and stands sink or tip on soft or sloping ground, so the vehicle is moved to a proper surface first.'
				}
			]
		},
		{
			code: 'SAF-03',
			title: 'Choose protective equipment and handle shop chemicals using the safety data sheet',
			description:
				'Use the safety data sheet for a shop chemical to choose gloves, eye protection and ventilation, store and label it correctly and deal with a small spill.',
			tier: 1,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{ text: 'Identifies the product from its label and finds its safety data sheet' },
				{
					text: 'Reads the hazard, first-aid, handling and protective-equipment sections and explains them in plain words'
				},
				{
					text: 'Puts on the protective equipment the sheet calls for, such as safety glasses or goggles and chemical-resistant gloves',
					safety: true
				},
				{ text: 'Works with adequate ventilation and away from ignition sources', safety: true },
				{
					text: 'Keeps the product in its original or a correctly labelled container with the lid closed when not in use'
				},
				{
					text: 'Knows where the eyewash station and spill kit are and cleans a small spill with absorbent'
				},
				{ text: 'Disposes of used rags and absorbent in the correct closed containers' }
			],
			specs: [],
			tools: [
				'Safety glasses and goggles',
				'Nitrile gloves',
				'Face shield',
				'Spill kit and absorbent',
				'Eyewash station'
			],
			cautions: [
				'Solvents and aerosol cleaners are flammable; keep them away from sparks, heaters and welding.',
				'Chemical splashes to the eye need immediate, prolonged flushing at the eyewash.',
				'Oily rags can self-heat; store them in a closed metal container.'
			],
			serviceInfo: ['safety data sheet'],
			questions: [
				{
					prompt: 'Where do you find which gloves to wear with a new parts cleaner?',
					options: [
						{ text: 'Any glove will do as long as it is disposable', correct: false },
						{
							text: 'In the exposure controls and personal protection section of its safety data sheet',
							correct: true
						},
						{ text: 'On the vehicle maintenance schedule', correct: false }
					],
					explanation:
						'The safety data sheet names the protection needed because not every glove material resists every chemical.'
				},
				{
					prompt:
						'Why must chlorinated brake cleaner be kept well away from welding and hot surfaces?',
					options: [
						{ text: 'It makes the weld porous but is otherwise harmless', correct: false },
						{ text: 'It freezes on contact with hot metal', correct: false },
						{
							text: 'Heat can break it down into highly toxic gases',
							correct: true
						}
					],
					explanation:
						'Chlorinated solvents decompose under heat or arc light into poisonous gases, which is why the data sheet warns against it.'
				},
				{
					prompt:
						'You pour coolant into an unmarked bottle to carry it to the bay. What is the problem?',
					options: [
						{
							text: 'An unlabelled container can be mistaken for a drink or another fluid; every container must show what it holds and its hazards',
							correct: true
						},
						{ text: 'There is no problem if you use it within the day', correct: false },
						{ text: 'Coolant must always be kept in metal containers', correct: false }
					],
					explanation:
						'Secondary containers need a label so nobody swallows, misuses or mixes the contents.'
				},
				{
					prompt: 'How should brake dust be cleaned from a drum or caliper?',
					options: [
						{ text: 'By tapping the drum on the floor to knock the dust out', correct: false },
						{
							text: 'With a wet-cleaning method or an approved enclosed vacuum, never with compressed air',
							correct: true
						},
						{ text: 'With compressed air while holding your breath', correct: false }
					],
					explanation:
						'Blowing dust puts fine particles, which may include harmful fibres, into the air you and others breathe.'
				},
				{
					prompt: 'Solvent splashes into the eye of a coworker. What do you do first?',
					options: [
						{ text: 'Tell them to rub the eye to clear it', correct: false },
						{ text: 'Look up the data sheet before doing anything else', correct: false },
						{
							text: 'Take them to the eyewash and help them flush the eye continuously, then get medical help and the data sheet',
							correct: true
						}
					],
					explanation:
						'Seconds matter with eye chemicals, so flushing starts at once and the data sheet goes with them to the medical provider.'
				}
			]
		},
		{
			code: 'SAF-04',
			title: 'Choose and use a portable fire extinguisher',
			description:
				'Identify the class of a shop fire, decide whether it is safe to fight it, and discharge the right portable extinguisher correctly.',
			tier: 1,
			requiredLevel: 3,
			minHours: 1,
			checklist: [
				{ text: 'Raises the alarm and makes sure others are leaving', safety: true },
				{
					text: 'Judges whether the fire is small and contained, and keeps a clear exit behind them',
					safety: true
				},
				{
					text: 'Chooses an extinguisher rated for the class of fire and checks its gauge is in the operating range'
				},
				{ text: 'Pulls the pin and tests the discharge briefly from a safe distance' },
				{ text: 'Aims at the base of the fire and sweeps side to side until it is out' },
				{ text: 'Backs away while watching for re-ignition', safety: true },
				{ text: 'Reports the discharge so the extinguisher is recharged or replaced' }
			],
			specs: [],
			tools: [
				'Multipurpose dry-chemical extinguisher',
				'Carbon dioxide extinguisher',
				'Fire blanket'
			],
			cautions: [
				'If the fire is spreading or smoke is building, leave and call the fire service.',
				'Never use water on burning fuel, oil or energised electrical equipment.'
			],
			serviceInfo: ['safety data sheet'],
			questions: [
				{
					prompt:
						'A drain pan of fuel catches fire. Which extinguisher ratings suit it? (Choose two.)',
					options: [
						{ text: 'A pressurised water extinguisher', correct: false },
						{ text: 'A bucket of water from the parts washer', correct: false },
						{ text: 'A multipurpose dry chemical rated for flammable liquids', correct: true },
						{ text: 'A carbon dioxide extinguisher rated for flammable liquids', correct: true }
					],
					explanation:
						'Flammable liquid fires need an agent that smothers or interrupts the flame; water spreads burning fuel.'
				},
				{
					prompt: 'Where do you aim the extinguisher?',
					options: [
						{ text: 'At the smoke, to cool the air', correct: false },
						{ text: 'At the base of the flames, sweeping side to side', correct: true },
						{ text: 'At the top of the flames where the heat is', correct: false }
					],
					explanation:
						'The fuel burns at the base, so that is where the agent must go to put the fire out.'
				},
				{
					prompt: 'Before you fight a fire, where should the exit be?',
					options: [
						{ text: 'On the far side of the fire', correct: false },
						{ text: 'It does not matter if the fire is small', correct: false },
						{ text: 'Behind you, so you can back away without passing the fire', correct: true }
					],
					explanation:
						'Fires grow fast; a clear escape route behind you means you can leave if the extinguisher does not work.'
				},
				{
					prompt: 'The gauge needle on the extinguisher is in the red zone. What does it mean?',
					options: [
						{
							text: 'It may not discharge properly; use another and report it for service',
							correct: true
						},
						{ text: 'It is fully charged and ready', correct: false },
						{ text: 'It is only for electrical fires', correct: false }
					],
					explanation:
						'The gauge shows whether the extinguisher is pressurised; outside the green zone it may fail when you need it.'
				},
				{
					prompt: 'The fire is out. What next?',
					options: [
						{ text: 'Restart the job straight away', correct: false },
						{
							text: 'Keep watching for re-ignition, then report the used extinguisher so it is recharged',
							correct: true
						},
						{ text: 'Hang the extinguisher back up; there is plenty left', correct: false }
					],
					explanation:
						'Hot fuel and materials can re-ignite, and a partly used extinguisher may not work at the next fire.'
				}
			]
		},
		{
			code: 'SAF-05',
			title: 'Tighten fasteners to specification with a click-type torque wrench',
			description:
				'Select, set and use a click-type torque wrench to tighten fasteners to a specified value in the right sequence, and store and care for it so it stays accurate.',
			tier: 1,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{ text: 'Looks up the torque value, sequence and any stages in service information' },
				{
					text: 'Chooses a wrench whose range puts the value well inside its scale and checks the calibration label is current'
				},
				{
					text: 'Cleans the threads and applies lubricant or thread-locker only if the specification calls for it'
				},
				{
					text: 'Sets the wrench in the unit of the specification, converting correctly if needed'
				},
				{
					text: 'Pulls smoothly on the handle grip at right angles to the wrench and stops at the click',
					safety: true
				},
				{ text: 'Tightens in the specified sequence and stages', safety: true },
				{ text: 'Returns the wrench to its lowest setting and stores it in its case' }
			],
			specs: [
				{
					label: 'Typical passenger-car wheel nut torque',
					value: 110,
					unit: 'N·m',
					limit: 'nominal'
				},
				{
					label: 'Click wrench accuracy tolerance, 20 to 100 % of scale',
					value: 4,
					unit: '%',
					limit: 'maximum'
				}
			],
			tools: ['Click-type torque wrench', 'Torque angle gauge', 'Thread chaser'],
			cautions: [
				'An under- or over-tightened wheel nut, brake or suspension fastener can let a wheel or part come off.',
				'Do not use a torque wrench as a breaker bar to loosen fasteners.'
			],
			serviceInfo: ['specifications', 'repair procedure'],
			questions: [
				{
					prompt: 'Why is a click wrench stored at its lowest setting?',
					options: [
						{ text: 'So the next user has to think about the setting', correct: false },
						{ text: 'It stops the ratchet from seizing', correct: false },
						{
							text: 'Leaving the spring compressed for long periods changes its calibration',
							correct: true
						}
					],
					explanation:
						'The click depends on a spring; keeping it compressed weakens it and the wrench starts clicking early.'
				},
				{
					prompt: 'A fastener calls for 25 N·m. Which wrench is the best choice?',
					options: [
						{ text: 'A wrench with a 5 to 60 N·m range', correct: true },
						{ text: 'A wrench with a 40 to 200 N·m range', correct: false },
						{ text: 'A wrench with a 20 to 100 N·m range set at its bottom mark', correct: false }
					],
					explanation:
						'Click wrenches are most accurate in the middle of their range and are not rated below about a fifth of full scale.'
				},
				{
					prompt:
						'The specification is 80 lbf·ft and your wrench reads only in N·m. What do you set?',
					options: [
						{ text: 'About 59 N·m', correct: false },
						{ text: '80 N·m', correct: false },
						{ text: 'About 960 N·m', correct: false },
						{ text: 'About 108 N·m', correct: true }
					],
					explanation: 'One lbf·ft is about 1.356 N·m, so 80 lbf·ft is about 108 N·m.'
				},
				{
					prompt: 'The wrench clicks. What should you do?',
					options: [
						{ text: 'Give it a final extra pull to be sure', correct: false },
						{ text: 'Pull until it clicks twice', correct: false },
						{ text: 'Stop pulling; the fastener has reached the set torque', correct: true }
					],
					explanation:
						'Pulling past the click over-tightens the fastener by an unknown amount and defeats the purpose of the tool.'
				},
				{
					prompt:
						'Which of these change the torque actually applied to the fastener? (Choose two.)',
					options: [
						{ text: 'Which hand you use to hold the wrench', correct: false },
						{ text: 'Oil on threads that are specified to be torqued dry', correct: true },
						{ text: 'Jerking the wrench instead of pulling smoothly', correct: true },
						{ text: 'Using a longer socket of the same size', correct: false }
					],
					explanation:
						'Lubricant lets the same torque stretch the fastener further, and a sudden jerk overshoots the set value before the click is felt.'
				},
				{
					prompt: 'A torque wrench falls off the bench onto the concrete. What now?',
					options: [
						{ text: 'Set it 10 % higher to make up for any damage', correct: false },
						{ text: 'Take it out of use until its calibration has been checked', correct: true },
						{ text: 'Check the scale is not cracked and carry on', correct: false }
					],
					explanation:
						'A knock can shift the mechanism, and an inaccurate wrench gives false confidence on critical fasteners.'
				}
			]
		},
		{
			code: 'SAF-06',
			title: 'Measure parts with an outside micrometer and a dial indicator',
			description:
				'Take and record thickness readings with an outside micrometer and runout readings with a dial indicator, and compare them with specification.',
			tier: 2,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{ text: 'Cleans the anvil and spindle faces and checks the micrometer zeroes correctly' },
				{ text: 'Measures square to the part using the ratchet so the measuring force is even' },
				{ text: 'Reads the sleeve and thimble correctly and takes readings at several points' },
				{ text: 'Mounts the dial indicator base rigidly with the plunger square to the surface' },
				{ text: 'Preloads the plunger, zeroes the dial and turns the part one full revolution' },
				{
					text: 'Records the total indicator reading and compares every result with specification'
				},
				{ text: 'Cleans the instruments and stores them in their cases' }
			],
			specs: [
				{
					label: 'Brake rotor minimum thickness (example)',
					value: 26,
					unit: 'mm',
					limit: 'minimum'
				},
				{
					label: 'Brake rotor lateral runout (example)',
					value: 0.05,
					unit: 'mm',
					limit: 'maximum'
				},
				{ label: 'Metric micrometer resolution', value: 0.01, unit: 'mm', limit: 'nominal' }
			],
			tools: [
				'Outside micrometer set',
				'Dial indicator with magnetic base',
				'Feeler gauges',
				'Vernier caliper'
			],
			cautions: [
				'Check that the vehicle is secure on the lift or stands before measuring parts on it.'
			],
			serviceInfo: ['specifications'],
			questions: [
				{
					prompt:
						'On a metric micrometer the sleeve shows 12.5 mm fully visible and the thimble line reads 28. What is the measurement?',
					options: [
						{ text: '12.28 mm', correct: false },
						{ text: '15.30 mm', correct: false },
						{ text: '12.528 mm', correct: false },
						{ text: '12.78 mm', correct: true }
					],
					explanation:
						'Add the sleeve reading (12.5 mm) to the thimble reading (28 × 0.01 mm = 0.28 mm) for 12.78 mm.'
				},
				{
					prompt: 'Why is the dial indicator plunger preloaded before it is zeroed?',
					options: [
						{
							text: 'So it can read movement both towards and away from it without losing contact',
							correct: true
						},
						{ text: 'To warm up the gear train', correct: false },
						{ text: 'It is not needed; any starting point will do', correct: false }
					],
					explanation:
						'Without preload the plunger can lift off on the low spot and the low side of the runout goes unmeasured.'
				},
				{
					prompt:
						'A rotor measures 25.7 mm and its minimum thickness is 26.0 mm. What does this mean?',
					options: [
						{ text: 'The rotor is within tolerance', correct: false },
						{ text: 'The rotor is below minimum and must be replaced', correct: true },
						{ text: 'The rotor can be machined once more', correct: false }
					],
					explanation:
						'A minimum is a lower limit; a thinner rotor cannot absorb and shed heat safely and cannot be machined.'
				}
			]
		},
		{
			code: 'SAF-07',
			title: 'Measure voltage, resistance and current with a digital multimeter',
			description:
				'Set up a digital multimeter safely and use it to measure voltage, voltage drop, resistance and current on low-voltage vehicle circuits.',
			tier: 2,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{
					text: 'Checks the meter category rating and that leads and probes are undamaged',
					safety: true
				},
				{ text: 'Checks the meter on a known voltage source before and after the test' },
				{ text: 'Measures voltage in parallel with the component with the circuit operating' },
				{
					text: 'Measures resistance only on a de-energised, isolated component and subtracts lead resistance'
				},
				{
					text: 'Measures current in series using the current jack, within the fused rating of the meter',
					safety: true
				},
				{ text: 'Returns the leads to the voltage jack after a current test' },
				{ text: 'Records readings with units and compares them with specification' }
			],
			specs: [
				{ label: 'Fully charged 12 V battery at rest', value: 12.6, unit: 'V', limit: 'nominal' },
				{
					label: 'Voltage drop across a ground connection under load',
					value: 0.1,
					unit: 'V',
					limit: 'maximum'
				},
				{ label: 'Meter fused current input rating', value: 10, unit: 'A', limit: 'maximum' },
				{
					label: 'Test lead resistance with leads touched together',
					value: 0.3,
					unit: 'Ω',
					limit: 'maximum'
				}
			],
			tools: [
				'Digital multimeter',
				'Back-probe pins',
				'Fused jumper leads',
				'Inductive current clamp'
			],
			cautions: [
				'Never connect the meter in the current jack across a voltage source; it shorts the circuit.',
				'Keep leads away from fans and belts on a running engine.'
			],
			serviceInfo: ['wiring diagram', 'diagnostic procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why must resistance be measured with the circuit de-energised?',
					options: [
						{ text: 'Resistance changes only when the circuit is switched off', correct: false },
						{ text: 'It saves the battery in the meter', correct: false },
						{
							text: 'The meter supplies its own small current; outside voltage gives a false reading and can damage the meter',
							correct: true
						}
					],
					explanation:
						'An ohmmeter works by passing a known current, so any voltage already in the circuit corrupts the reading.'
				},
				{
					prompt: 'Which reading best shows a corroded ground connection on a headlamp circuit?',
					options: [
						{
							text: 'A voltage drop across the ground connection, measured with the lamp switched on, above specification',
							correct: true
						},
						{ text: 'Battery voltage measured with the lamp switched off', correct: false },
						{ text: 'Resistance of the bulb filament', correct: false }
					],
					explanation:
						'A poor connection only shows its resistance while current flows, so voltage drop is measured with the circuit working.'
				},
				{
					prompt: 'You have just measured current. What must you do before measuring voltage?',
					options: [
						{ text: 'Reverse the leads', correct: false },
						{ text: 'Move the red lead back to the voltage jack', correct: true },
						{ text: 'Nothing; the meter changes jacks itself', correct: false }
					],
					explanation:
						'In the current jack the meter is almost a short circuit, so connecting it across a voltage blows its fuse or damages the circuit.'
				}
			]
		},
		{
			code: 'SAF-08',
			title: 'Use impact tools, air hoses and blow guns safely',
			description:
				'Inspect and use pneumatic tools with the correct sockets, pressure and protection, and finish critical fasteners with a torque wrench.',
			tier: 2,
			requiredLevel: 3,
			minHours: 1,
			checklist: [
				{ text: 'Inspects the hose, couplers and tool for damage and leaks' },
				{ text: 'Wears eye and hearing protection', safety: true },
				{ text: 'Checks the regulator pressure suits the tool' },
				{ text: 'Uses impact-rated sockets and extensions only', safety: true },
				{ text: 'Disconnects the air supply before changing sockets or bits', safety: true },
				{
					text: 'Runs wheel nuts and other critical fasteners down and finishes them with a torque wrench',
					safety: true
				},
				{ text: 'Uses a blow gun with a pressure-limiting nozzle and never points it at a person' }
			],
			specs: [
				{ label: 'Typical air tool inlet pressure', value: 90, unit: 'psi', limit: 'nominal' },
				{
					label: 'Blow gun pressure with the nozzle blocked',
					value: 30,
					unit: 'psi',
					limit: 'maximum'
				}
			],
			tools: [
				'Air impact wrench',
				'Impact sockets',
				'Air ratchet',
				'Safety blow gun',
				'Hearing protection'
			],
			cautions: [
				'Compressed air can enter the skin or eyes and cause serious injury.',
				'Hand-tool sockets can shatter on an impact wrench.',
				'Keep loose clothing and hair away from spinning tools.'
			],
			serviceInfo: ['repair procedure'],
			questions: [
				{
					prompt: 'Why are chrome hand-tool sockets not used on an impact wrench?',
					options: [
						{ text: 'They are too heavy for the anvil', correct: false },
						{ text: 'They scratch alloy wheels', correct: false },
						{
							text: 'They are harder and more brittle and can crack or shatter under hammering blows',
							correct: true
						}
					],
					explanation:
						'Impact sockets are made thicker and tougher to absorb repeated blows without breaking.'
				},
				{
					prompt: 'Why are wheel nuts finished with a torque wrench after an impact wrench?',
					options: [
						{
							text: 'An impact wrench gives an uncontrolled torque that can stretch studs or warp rotors, or leave nuts loose',
							correct: true
						},
						{ text: 'It is only needed for alloy wheels', correct: false },
						{ text: 'The torque wrench cleans the threads', correct: false }
					],
					explanation:
						'Only a calibrated torque wrench confirms the specified clamp load on a safety-critical fastener.'
				}
			]
		},
		{
			code: 'SAF-09',
			title: 'Collect, store and dispose of used fluids, filters and batteries',
			description:
				'Separate used oil, coolant, solvents, filters and batteries into their labelled containers, clean up spills and keep waste out of drains.',
			tier: 2,
			requiredLevel: 3,
			minHours: 1,
			checklist: [
				{ text: 'Identifies each waste fluid and the correct labelled container for it' },
				{ text: 'Keeps used oil free of solvents, brake cleaner and coolant' },
				{ text: 'Drains oil filters before putting them in the filter container' },
				{ text: 'Stores used batteries upright on a non-conductive surface away from drains' },
				{
					text: 'Cleans spills with absorbent and keeps all fluids out of floor and storm drains',
					safety: true
				},
				{ text: 'Keeps waste containers closed and records quantities as the shop requires' }
			],
			specs: [],
			tools: [
				'Drain pans',
				'Labelled waste drums',
				'Filter crusher or drain rack',
				'Absorbent',
				'Funnels'
			],
			cautions: [
				'Hot drained fluids can scald.',
				'Coolant tastes sweet and is poisonous to people and animals; clean up every spill.',
				'Battery acid burns skin and eyes; wear gloves and eye protection.'
			],
			serviceInfo: ['safety data sheet'],
			questions: [
				{
					prompt: 'Why must solvents never be poured into the used-oil drum?',
					options: [
						{ text: 'It is fine in small amounts', correct: false },
						{
							text: 'Mixing can turn the whole drum into hazardous waste that cannot be recycled as used oil',
							correct: true
						},
						{ text: 'Solvents make the oil too thick to pump', correct: false }
					],
					explanation:
						'Recyclers accept clean used oil; contamination with solvents makes disposal far harder and more costly.'
				},
				{
					prompt: 'A litre of coolant spills in the bay near a floor drain. What do you do?',
					options: [
						{ text: 'Hose it into the drain to dilute it', correct: false },
						{ text: 'Leave it to evaporate', correct: false },
						{
							text: 'Stop it reaching the drain with absorbent, clean it up and put the absorbent in the correct waste container',
							correct: true
						}
					],
					explanation:
						'Coolant is toxic, and floor and storm drains often lead to the environment rather than a treatment plant.'
				}
			]
		},
		{
			code: 'SAF-10',
			title: 'Disable and re-enable the airbag system for service',
			description:
				'Disable the supplemental restraint system before working near airbags, seat-belt pretensioners or their wiring, handle removed modules safely, and re-enable and check the system afterwards.',
			tier: 1,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{ text: 'Looks up the disabling procedure and component locations for the vehicle' },
				{
					text: 'Sets the wheels straight and the steering wheel centred, ignition off and key away from the vehicle'
				},
				{
					text: 'Disconnects and isolates the negative battery cable and waits the specified time for the reserve energy to drain',
					safety: true
				},
				{
					text: 'Disconnects the connector of the airbag or pretensioner being serviced without probing the circuit',
					safety: true
				},
				{
					text: 'Carries a removed airbag with the trim side away from the body and stores it trim side up on a clear bench',
					safety: true
				},
				{ text: 'Keeps the clock spring centred and connectors latched during reassembly' },
				{
					text: 'Reconnects the battery with nobody inside the vehicle and checks that the warning lamp turns on and then goes out',
					safety: true
				},
				{ text: 'Checks for stored trouble codes and records the result' }
			],
			specs: [],
			tools: ['Scan tool', 'Battery terminal insulator', 'Trim tools'],
			cautions: [
				'An airbag can deploy with great force; keep your body out of its path.',
				'Never probe airbag circuits with a test light or ohmmeter.',
				'Keep removed airbags away from heat, static and electrical sources.'
			],
			serviceInfo: ['repair procedure', 'wiring diagram', 'diagnostic procedure'],
			questions: [
				{
					prompt:
						'Why do you wait after disconnecting the battery before working on airbag components?',
					options: [
						{
							text: 'The airbag module stores energy that can still fire an airbag until it drains away',
							correct: true
						},
						{ text: 'To let the module forget the crash data', correct: false },
						{ text: 'To let the ignition system cool down', correct: false }
					],
					explanation:
						'A reserve capacitor keeps the system able to deploy for a short time after power is lost, so the specified wait must pass.'
				},
				{
					prompt: 'How should a removed driver airbag be placed on the bench?',
					options: [
						{ text: 'On its edge so it takes less space', correct: false },
						{ text: 'Trim cover facing up, away from the bench', correct: true },
						{ text: 'Trim cover facing down to protect it', correct: false }
					],
					explanation:
						'If it deployed face down it would launch itself off the bench; face up it inflates harmlessly upward.'
				},
				{
					prompt: 'Why must you not check an airbag inflator with an ohmmeter?',
					options: [
						{ text: 'The reading is not accurate at low resistance', correct: false },
						{ text: 'It voids the module warranty only', correct: false },
						{ text: 'The meter current may be enough to set it off', correct: true }
					],
					explanation:
						'An ohmmeter pushes current through whatever it touches, and an inflator is designed to fire on a small current.'
				},
				{
					prompt:
						'Why centre the steering wheel and keep it from turning while the column or rack is disconnected?',
					options: [
						{
							text: 'Turning it can wind the clock spring past its limit and break the airbag circuit ribbon',
							correct: true
						},
						{ text: 'It keeps the wheel alignment correct', correct: false },
						{ text: 'It stops the horn sounding', correct: false }
					],
					explanation:
						'The clock spring only allows a set number of turns each way; an over-wound or off-centre one tears and causes an airbag fault.'
				},
				{
					prompt:
						'When you reconnect the battery after airbag work, which steps are right? (Choose two.)',
					options: [
						{
							text: 'Ignore the warning lamp; it clears itself after a few drives',
							correct: false
						},
						{ text: 'Make sure nobody is inside the vehicle', correct: true },
						{
							text: 'Switch the ignition on and check the warning lamp comes on for its self-check and then goes out',
							correct: true
						},
						{ text: 'Sit in the driver seat to watch the dash as you reconnect', correct: false }
					],
					explanation:
						'A fault or wrong connection could fire a bag on reconnection, and the warning lamp confirms the system sees no fault.'
				}
			]
		},
		{
			code: 'SAF-11',
			title: 'Jump-start a vehicle and connect a battery charger safely',
			description:
				'Boost a vehicle with a jump pack or another vehicle and connect a battery charger in the order that avoids sparks near the battery.',
			tier: 2,
			requiredLevel: 3,
			minHours: 1,
			checklist: [
				{
					text: 'Wears eye protection and checks the battery is not cracked, leaking or frozen',
					safety: true
				},
				{ text: 'Confirms both systems are 12 V and switches off loads and the booster' },
				{
					text: 'Connects positive to the dead battery, then positive to the booster, then negative to the booster'
				},
				{
					text: 'Makes the final negative connection to an engine ground point away from the battery',
					safety: true
				},
				{ text: 'Starts the vehicle and removes the clamps in the reverse order' },
				{
					text: 'For charging, connects the clamps before switching the charger on and selects the battery type'
				}
			],
			specs: [{ label: 'System voltage to match', value: 12, unit: 'V', limit: 'nominal' }],
			tools: ['Jump pack', 'Booster cables', 'Battery charger', 'Safety glasses'],
			cautions: [
				'Batteries give off hydrogen that a spark can ignite and explode.',
				'Never boost or charge a frozen battery.'
			],
			serviceInfo: ['owner information', 'repair procedure'],
			questions: [
				{
					prompt: 'Why is the last connection made to an engine ground away from the battery?',
					options: [
						{ text: 'It gives a higher voltage to the starter', correct: false },
						{ text: 'The battery negative post is not connected to ground', correct: false },
						{
							text: 'The final connection can spark, and hydrogen from the battery could ignite',
							correct: true
						}
					],
					explanation:
						'Moving the spark away from the battery vents prevents an explosion that could spray acid.'
				},
				{
					prompt: 'Why should a charger be switched on only after the clamps are connected?',
					options: [
						{ text: 'A live clamp touching a post can spark near the battery', correct: true },
						{ text: 'The charger measures the battery only at switch-on', correct: false },
						{ text: 'It charges faster that way', correct: false }
					],
					explanation: 'Connecting with the output off avoids a spark at the moment of contact.'
				}
			]
		},
		{
			code: 'SAF-12',
			title: 'Identify fasteners and repair damaged internal threads',
			description:
				'Identify thread size, pitch and strength grade of fasteners, know when a fastener must be replaced, and restore damaged threads with a thread chaser or a thread insert.',
			tier: 3,
			requiredLevel: 2,
			minHours: 2,
			checklist: [
				{ text: 'Identifies metric or inch threads with a pitch gauge and measures the diameter' },
				{ text: 'Reads the strength marking on the bolt head and matches the replacement to it' },
				{ text: 'Replaces fasteners that service information lists as single-use', safety: true },
				{ text: 'Cleans lightly damaged threads with a chaser rather than cutting new threads' },
				{
					text: 'For a thread insert, drills, taps and installs the insert to the kit instructions, then removes the tang'
				},
				{ text: 'Cleans out swarf and checks the repaired thread with the correct bolt by hand' }
			],
			specs: [
				{ label: 'Common wheel stud thread pitch (M12)', value: 1.5, unit: 'mm', limit: 'nominal' }
			],
			tools: [
				'Thread pitch gauge',
				'Vernier caliper',
				'Thread chaser set',
				'Thread insert kit',
				'Drill'
			],
			cautions: [
				'Wear eye protection when drilling and tapping.',
				'A fastener of lower strength than the original can fail under load.'
			],
			serviceInfo: ['specifications', 'repair procedure'],
			questions: [
				{
					prompt: 'Why is a bolt listed as torque-to-yield replaced rather than reused?',
					options: [
						{ text: 'It is too short once it has been tightened', correct: false },
						{
							text: 'It has been stretched permanently and will not give the correct clamp load again',
							correct: true
						},
						{ text: 'Its thread coating is only for appearance', correct: false }
					],
					explanation:
						'These bolts are tightened into their stretch range on purpose, so a second use risks breakage or lost clamp force.'
				},
				{
					prompt: 'Why use a thread chaser rather than a tap to clean threads?',
					options: [
						{ text: 'A chaser cuts deeper threads for a tighter fit', correct: false },
						{ text: 'There is no difference', correct: false },
						{ text: 'A chaser reforms the existing thread without removing metal', correct: true }
					],
					explanation:
						'A cutting tap can remove good metal and weaken the thread, while a chaser only cleans and straightens it.'
				}
			]
		}
	]
};
