import type { AreaDef } from '../../../framework/types';

export const area: AreaDef = {
	code: 'ENG',
	name: 'Engine repair',
	tasks: [
		{
			code: 'ENG-01',
			title: 'Perform a cranking compression test and interpret the results',
			description:
				'Measure cranking compression on every cylinder with fuel and ignition disabled, add a wet test where a cylinder is low, and say what the readings point to.',
			tier: 1,
			requiredLevel: 4,
			minHours: 3,
			checklist: [
				{
					text: 'Warms the engine to operating temperature and checks the battery is well charged'
				},
				{ text: 'Disables fuel and ignition as service information directs', safety: true },
				{
					text: 'Blows debris out of the plug wells and removes all spark plugs, keeping coils in order'
				},
				{
					text: 'Fits the gauge, holds the throttle wide open and cranks for the same number of strokes on each cylinder'
				},
				{
					text: 'Records every reading and compares it with specification and with the other cylinders'
				},
				{ text: 'Adds a small amount of oil to any low cylinder and retests' },
				{
					text: 'Refits the plugs torqued to specification and the coils, restores fuel and ignition',
					safety: true
				},
				{ text: 'Clears trouble codes set by the test and confirms the engine starts and runs' }
			],
			specs: [
				{ label: 'Cranking compression', value: 1000, unit: 'kPa', limit: 'minimum' },
				{
					label: 'Variation between highest and lowest cylinder',
					value: 10,
					unit: '%',
					limit: 'maximum'
				},
				{ label: 'Spark plug torque', value: 20, unit: 'N·m', limit: 'nominal' }
			],
			tools: [
				'Compression gauge with adapters',
				'Spark plug socket',
				'Torque wrench',
				'Remote starter switch',
				'Oil can'
			],
			cautions: [
				'Cranking with ignition live can give a severe shock and start a fire from fuel sprayed from the plug holes.',
				'Keep hands and leads away from the belts and fan while cranking.',
				'The engine and exhaust are hot; wear gloves.'
			],
			serviceInfo: ['specifications', 'diagnostic procedure', 'repair procedure'],
			questions: [
				{
					prompt: 'Why is the throttle held wide open during the test?',
					options: [
						{ text: 'To let the engine start more easily', correct: false },
						{ text: 'To keep the idle air valve closed', correct: false },
						{
							text: 'So each cylinder fills fully with air and the readings are consistent',
							correct: true
						}
					],
					explanation: 'A closed throttle restricts airflow and makes every cylinder read low.'
				},
				{
					prompt:
						'A low cylinder rises sharply after a spoonful of oil is added. What does it indicate?',
					options: [
						{ text: 'Worn or stuck piston rings or a worn cylinder wall', correct: true },
						{ text: 'A burnt exhaust valve', correct: false },
						{ text: 'A blown head gasket to the cooling system', correct: false }
					],
					explanation:
						'The oil temporarily seals the rings; valves and gaskets are not helped by it, so the rise points to rings.'
				},
				{
					prompt: 'Two neighbouring cylinders read low and about the same. What is a likely cause?',
					options: [
						{ text: 'Worn spark plugs', correct: false },
						{ text: 'A head gasket failure between those cylinders', correct: true },
						{ text: 'A weak battery', correct: false }
					],
					explanation:
						'A breach in the gasket between adjacent cylinders lets them leak into each other and both read low.'
				},
				{
					prompt: 'Why remove all the spark plugs, not just the one being tested?',
					options: [
						{ text: 'So no cylinder is under compression when the engine stops', correct: false },
						{ text: 'To check the plug gaps', correct: false },
						{
							text: 'So the engine cranks evenly at a steady speed for every cylinder',
							correct: true
						}
					],
					explanation:
						'With other plugs in, the cranking speed rises and falls and the readings are not comparable.'
				},
				{
					prompt: 'Why must fuel and ignition be disabled before cranking?',
					options: [
						{
							text: 'To stop fuel washing the cylinders and spraying out, and to stop coils sparking in the open air',
							correct: true
						},
						{ text: 'To protect the compression gauge from heat', correct: false },
						{ text: 'To keep the battery charged', correct: false }
					],
					explanation:
						'Fuel sprayed into the engine bay is a fire risk and washes oil off the cylinder walls, which lowers the readings.'
				},
				{
					prompt: 'Every cylinder reads evenly but low. Which is a likely cause?',
					options: [
						{ text: 'One cracked piston', correct: false },
						{
							text: 'Incorrect camshaft timing, such as a belt or chain that has jumped',
							correct: true
						},
						{ text: 'One burnt exhaust valve', correct: false }
					],
					explanation:
						'A fault that affects all cylinders the same way points to something common to them, such as valve timing.'
				}
			]
		},
		{
			code: 'ENG-02',
			title: 'Perform a cylinder leakage test and find where the air escapes',
			description:
				'Pressurise each cylinder at top dead centre on its compression stroke, read the percentage of leakage and locate the leak path by listening and watching.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{
					text: 'Removes the plugs and sets the cylinder at top dead centre on the compression stroke'
				},
				{ text: 'Holds the crankshaft so it cannot turn when air is applied', safety: true },
				{ text: 'Calibrates the tester and connects it to the cylinder' },
				{ text: 'Reads and records the percentage of leakage' },
				{
					text: 'Listens at the intake, tailpipe and oil filler and watches the coolant for bubbles'
				},
				{ text: 'Repeats for each cylinder in firing order and refits the plugs to specification' }
			],
			specs: [
				{ label: 'Cylinder leakage', value: 20, unit: '%', limit: 'maximum' },
				{ label: 'Tester supply pressure', value: 700, unit: 'kPa', limit: 'nominal' }
			],
			tools: [
				'Cylinder leakage tester',
				'Breaker bar and socket for the crankshaft',
				'Piston stop or probe'
			],
			cautions: [
				'If the piston is not at top dead centre, air pressure can turn the crankshaft suddenly and swing the wrench.',
				'Open the coolant cap only on a cold engine.'
			],
			serviceInfo: ['diagnostic procedure', 'specifications'],
			questions: [
				{
					prompt: 'Air is heard at the oil filler opening. Where is the leak?',
					options: [
						{ text: 'Past the intake valve', correct: false },
						{ text: 'Past the exhaust valve', correct: false },
						{ text: 'Past the piston rings into the crankcase', correct: true }
					],
					explanation: 'The crankcase is below the rings, so air there has come down past them.'
				},
				{
					prompt: 'Bubbles rise in the coolant during the test. What does that suggest?',
					options: [
						{
							text: 'A head gasket leak or cracked head or block into the cooling system',
							correct: true
						},
						{ text: 'Normal coolant circulation', correct: false },
						{ text: 'A leaking intake gasket', correct: false }
					],
					explanation:
						'Air from the cylinder can only reach the coolant through a breach between them.'
				},
				{
					prompt: 'Why must the piston be at top dead centre on the compression stroke?',
					options: [
						{ text: 'It gives the lowest leakage reading', correct: false },
						{
							text: 'Both valves are closed then, and the crankshaft is less likely to be pushed round',
							correct: true
						},
						{ text: 'The rings seal only at the top of the bore', correct: false }
					],
					explanation:
						'An open valve gives a false leak, and a piston away from top centre is pushed down by the air.'
				}
			]
		},
		{
			code: 'ENG-03',
			title: 'Replace a timing belt, tensioner and idlers',
			description:
				'Set the engine at its timing reference, lock the camshafts and crankshaft where required, fit a new belt and tensioner, set tension and prove the timing by turning the engine by hand.',
			tier: 1,
			requiredLevel: 3,
			minHours: 8,
			checklist: [
				{
					text: 'Looks up the procedure, whether the engine is interference type and which locking tools are needed'
				},
				{ text: 'Disconnects the battery and removes accessories and covers' },
				{
					text: 'Turns the crankshaft in its normal direction to the timing marks and fits locking tools',
					safety: true
				},
				{ text: 'Releases the tensioner and removes the belt without turning the camshafts' },
				{
					text: 'Checks for oil or coolant leaks that could contaminate the new belt and replaces the seals or water pump as specified'
				},
				{
					text: 'Fits the belt with the drive side tight, routes it correctly and sets the tensioner to its mark',
					safety: true
				},
				{
					text: 'Removes locking tools and turns the engine two full revolutions by hand, then rechecks all marks',
					safety: true
				},
				{
					text: 'Torques the tensioner and crankshaft pulley bolts to specification, fitting new bolts where required',
					safety: true
				},
				{ text: 'Refits covers, starts the engine and checks for noise, leaks and warning lamps' }
			],
			specs: [
				{ label: 'Tensioner bolt torque', value: 25, unit: 'N·m', limit: 'nominal' },
				{
					label: 'Crankshaft pulley bolt torque, first stage before angle',
					value: 100,
					unit: 'N·m',
					limit: 'nominal'
				}
			],
			tools: [
				'Camshaft and crankshaft locking tools',
				'Pulley holder',
				'Torque wrench',
				'Torque angle gauge',
				'Tensioner tool'
			],
			cautions: [
				'On an interference engine, wrong timing can bend valves as soon as it is turned.',
				'Keep fingers out of the belt and pulleys when turning the engine.',
				'Disconnect the battery so nobody can crank the engine while you work.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'maintenance schedule'],
			questions: [
				{
					prompt: 'Why is the engine turned two full revolutions by hand before it is started?',
					options: [
						{ text: 'To spread oil onto the new belt', correct: false },
						{ text: 'To bed in the tensioner spring', correct: false },
						{
							text: 'To prove the timing marks line up again and that no valve touches a piston',
							correct: true
						}
					],
					explanation:
						'Two crankshaft turns bring the camshafts round once, so any timing error or interference shows up gently by hand.'
				},
				{
					prompt: 'What does interference engine mean?',
					options: [
						{
							text: 'Valves and pistons share space at different times, so they collide if the timing is wrong',
							correct: true
						},
						{ text: 'The belt interferes with the accessory drive', correct: false },
						{ text: 'The engine causes radio interference', correct: false }
					],
					explanation:
						'On these engines a broken or mis-fitted belt usually bends valves or breaks pistons.'
				},
				{
					prompt:
						'Why is the belt fitted so the side between the crankshaft and the camshaft drive is tight?',
					options: [
						{ text: 'It does not matter which side is tight', correct: false },
						{
							text: 'Any slack ends up on the tensioner side, so the timing stays correct when tension is set',
							correct: true
						},
						{ text: 'It makes the belt quieter', correct: false }
					],
					explanation:
						'Slack in the drive side moves the camshafts a tooth or more relative to the crankshaft when the tensioner is released.'
				},
				{
					prompt:
						'Why is a water pump driven by the timing belt usually replaced at the same time?',
					options: [
						{ text: 'The new belt will not fit the old pump', correct: false },
						{ text: 'It is required on every engine by law', correct: false },
						{
							text: 'A pump failure later would mean removing the new belt again, and a leak can ruin the belt',
							correct: true
						}
					],
					explanation:
						'The pump has similar wear, and coolant on a belt weakens it and can make it slip or break.'
				},
				{
					prompt: 'Why turn the engine only in its normal direction of rotation?',
					options: [
						{
							text: 'Turning backwards can let the belt go slack on the drive side and jump a tooth',
							correct: true
						},
						{ text: 'The starter locks it the other way', correct: false },
						{ text: 'The oil pump would run backwards and lose prime permanently', correct: false }
					],
					explanation:
						'The tensioner only takes up slack on one side; reverse rotation puts slack where nothing controls it.'
				}
			]
		},
		{
			code: 'ENG-04',
			title: 'Pressure-test the cooling system and radiator cap',
			description:
				'Pressurise a cold cooling system to the cap rating to find external and internal leaks, and test that the cap holds and relieves at its rating.',
			tier: 1,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{ text: 'Confirms the engine is cold before removing the cap', safety: true },
				{ text: 'Tops up the coolant and fits the tester with the correct adapter' },
				{ text: 'Pumps to the cap rating and no higher', safety: true },
				{
					text: 'Watches the gauge for a drop while inspecting hoses, radiator, water pump, heater connections and the floor'
				},
				{ text: 'Tests the cap on its adapter for holding and relief pressure' },
				{ text: 'Runs a combustion gas test when pressure falls with no external leak' },
				{ text: 'Releases pressure slowly before removing the tester and records results' }
			],
			specs: [
				{ label: 'Radiator cap rating', value: 110, unit: 'kPa', limit: 'nominal' },
				{ label: 'Radiator cap relief pressure', value: 95, unit: 'kPa', limit: 'minimum' },
				{ label: 'Radiator cap relief pressure', value: 125, unit: 'kPa', limit: 'maximum' }
			],
			tools: [
				'Cooling system pressure tester with adapters',
				'Cap adapter',
				'Combustion leak test kit',
				'Flashlight'
			],
			cautions: [
				'Opening a hot system can spray scalding coolant.',
				'Pressure above the cap rating can burst a radiator or hose.'
			],
			serviceInfo: ['specifications', 'diagnostic procedure'],
			questions: [
				{
					prompt: 'Why is the cooling system run under pressure?',
					options: [
						{ text: 'It stops the thermostat from opening too early', correct: false },
						{ text: 'Pressure raises the boiling point of the coolant', correct: true },
						{ text: 'Pressure makes the water pump work harder', correct: false }
					],
					explanation:
						'Each increase in pressure raises the boiling point, letting the engine run hot without the coolant boiling.'
				},
				{
					prompt: 'Why is the system never pumped above the cap rating?',
					options: [
						{ text: 'The gauge cannot read higher', correct: false },
						{ text: 'It would show too much leakage', correct: false },
						{
							text: 'It can burst hoses, the radiator or heater core and cause a leak that was not there',
							correct: true
						}
					],
					explanation: 'The cap rating is the highest pressure the system sees in use.'
				},
				{
					prompt:
						'The pressure falls steadily but there is no external leak. Which are likely causes? (Choose two.)',
					options: [
						{ text: 'A faulty temperature gauge', correct: false },
						{ text: 'A new radiator cap', correct: false },
						{ text: 'A head gasket leak into a cylinder', correct: true },
						{ text: 'A leaking heater core, wetting the floor inside the cabin', correct: true }
					],
					explanation:
						'Coolant that leaves but is not seen outside is going into the engine or the cabin, which the next tests must confirm.'
				},
				{
					prompt: 'What happens when a radiator cap no longer holds its rated pressure?',
					options: [
						{ text: 'Nothing, as long as the level is full', correct: false },
						{
							text: 'The coolant boils at a lower temperature and the engine can overheat or lose coolant',
							correct: true
						},
						{ text: 'The engine runs cooler', correct: false }
					],
					explanation: 'The cap sets the system pressure, and without it the boiling point falls.'
				},
				{
					prompt:
						'A combustion leak test fluid changes colour while sampling over the radiator neck. What does this show?',
					options: [
						{ text: 'The coolant is the wrong type', correct: false },
						{ text: 'The coolant is too hot', correct: false },
						{
							text: 'Exhaust gases are in the coolant, pointing to a head gasket or cracked head',
							correct: true
						}
					],
					explanation:
						'The fluid reacts to combustion gases, which should never be present in the cooling system.'
				}
			]
		},
		{
			code: 'ENG-05',
			title: 'Replace the thermostat and bleed the cooling system',
			description:
				'Replace a thermostat and its seal with the correct orientation, refill and bleed the system and confirm the engine warms up and holds temperature.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{
					text: 'Confirms the engine is cold and drains coolant below the thermostat',
					safety: true
				},
				{ text: 'Removes the housing and notes how the thermostat and any air-bleed valve sit' },
				{ text: 'Cleans the mating faces without gouging them' },
				{ text: 'Fits the new thermostat the right way round with a new seal' },
				{ text: 'Torques the housing bolts to specification', safety: true },
				{
					text: 'Refills, bleeds and warms the engine, checking the upper hose heats when the thermostat opens'
				},
				{ text: 'Checks for leaks and sets the coolant level when cold' }
			],
			specs: [
				{ label: 'Thermostat opening temperature', value: 88, unit: '°C', limit: 'nominal' },
				{ label: 'Thermostat housing bolt torque', value: 10, unit: 'N·m', limit: 'nominal' }
			],
			tools: [
				'Drain pan',
				'Plastic scraper',
				'Torque wrench',
				'Spill-free filling funnel',
				'Infrared thermometer'
			],
			cautions: ['Hot coolant under pressure can scald.', 'Keep clear of the fan during warm-up.'],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'What symptom points to a thermostat stuck open?',
					options: [
						{ text: 'Slow warm-up, low gauge reading and weak heater output', correct: true },
						{ text: 'Rapid overheating within minutes', correct: false },
						{ text: 'Coolant in the oil', correct: false }
					],
					explanation:
						'Coolant flows through the radiator all the time, so the engine struggles to reach temperature.'
				},
				{
					prompt: 'Why is a plastic scraper used on the aluminium housing faces?',
					options: [
						{ text: 'Steel reacts with coolant', correct: false },
						{ text: 'A steel scraper can gouge the soft metal and cause leaks', correct: true },
						{ text: 'Plastic removes gasket material faster', correct: false }
					],
					explanation:
						'Seals need a smooth, flat surface; scratches across the face make leak paths.'
				}
			]
		},
		{
			code: 'ENG-06',
			title: 'Replace an accessory-belt-driven water pump',
			description:
				'Diagnose a leaking or noisy water pump, replace it with new sealing and correct torque, and refill and bleed the cooling system.',
			tier: 2,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{ text: 'Confirms the pump is at fault by weep-hole leakage, bearing play or noise' },
				{ text: 'Drains the cold system and removes the drive belt and pulley' },
				{ text: 'Removes the pump and cleans the sealing surface' },
				{ text: 'Fits the new pump with the specified gasket or sealant' },
				{ text: 'Torques the bolts in a criss-cross pattern to specification', safety: true },
				{ text: 'Refits the pulley and belt on the correct routing' },
				{ text: 'Refills, bleeds and checks for leaks at operating temperature' }
			],
			specs: [
				{ label: 'Water pump bolt torque', value: 22, unit: 'N·m', limit: 'nominal' },
				{ label: 'Cooling system capacity', value: 6.5, unit: 'L', limit: 'nominal' }
			],
			tools: [
				'Drain pan',
				'Belt tensioner tool',
				'Torque wrench',
				'Gasket scraper',
				'Spill-free filling funnel'
			],
			cautions: [
				'Work on a cold engine only.',
				'Coolant is poisonous; collect all of it for disposal.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'Coolant is dripping from the small hole on the pump body. What does this mean?',
					options: [
						{ text: 'The system is overfilled', correct: false },
						{ text: 'It is normal condensation', correct: false },
						{ text: 'The pump shaft seal is failing and the pump needs replacing', correct: true }
					],
					explanation:
						'The weep hole lets coolant escape past a failed seal before it reaches the bearing.'
				},
				{
					prompt: 'Why are pump bolts tightened in a criss-cross pattern?',
					options: [
						{ text: 'To pull the pump down evenly so the gasket seals all round', correct: true },
						{ text: 'So the impeller turns freely', correct: false },
						{ text: 'It is quicker', correct: false }
					],
					explanation: 'Uneven tightening can tilt the flange and crush one side of the gasket.'
				}
			]
		},
		{
			code: 'ENG-07',
			title: 'Measure engine oil pressure with a mechanical gauge',
			description:
				'Fit a mechanical gauge in place of the oil pressure sender, read pressure hot at idle and at raised speed, and relate the results to possible causes.',
			tier: 2,
			requiredLevel: 3,
			minHours: 1.5,
			checklist: [
				{ text: 'Checks oil level and condition first' },
				{
					text: 'Removes the sender and fits the gauge with the right adapter, hose routed clear of moving parts',
					safety: true
				},
				{
					text: 'Starts the engine and watches for pressure immediately, shutting down if there is none',
					safety: true
				},
				{ text: 'Reads pressure at hot idle and at the specified engine speed' },
				{ text: 'Refits the sender with sealant as specified and checks for leaks' }
			],
			specs: [
				{ label: 'Oil pressure at hot idle', value: 70, unit: 'kPa', limit: 'minimum' },
				{ label: 'Oil pressure at 3000 rpm, hot', value: 250, unit: 'kPa', limit: 'minimum' },
				{ label: 'Oil temperature for the test', value: 80, unit: '°C', limit: 'nominal' }
			],
			tools: ['Mechanical oil pressure gauge with adapters', 'Sender socket', 'Thread sealant'],
			cautions: [
				'Hot oil can spray from a loose fitting.',
				'Keep the gauge hose away from the belts, fan and exhaust.'
			],
			serviceInfo: ['specifications', 'diagnostic procedure'],
			questions: [
				{
					prompt: 'Why is oil pressure checked hot rather than cold?',
					options: [
						{ text: 'The pump does not turn when cold', correct: false },
						{
							text: 'Hot oil is thinner, so it shows worn bearings or a weak pump that cold oil hides',
							correct: true
						},
						{ text: 'Gauges only read correctly when hot', correct: false }
					],
					explanation:
						'The lowest pressure happens at hot idle, which is the real test of the lubrication system.'
				},
				{
					prompt: 'Which could cause low oil pressure? (Choose two.)',
					options: [
						{ text: 'A new oil filter of the correct type', correct: false },
						{ text: 'A fully charged battery', correct: false },
						{ text: 'Worn crankshaft bearings', correct: true },
						{ text: 'Oil diluted by fuel or of the wrong viscosity', correct: true }
					],
					explanation:
						'Wide bearing clearances and thin oil both let oil escape too easily, so pressure drops.'
				}
			]
		},
		{
			code: 'ENG-08',
			title: 'Replace a valve cover gasket and spark plug tube seals',
			description:
				'Remove the valve cover, clean the sealing faces, fit new gaskets with sealant only where specified and torque the cover bolts in sequence.',
			tier: 1,
			requiredLevel: 4,
			minHours: 3,
			checklist: [
				{
					text: 'Works on a cold engine and removes coils, hoses and brackets, labelling connectors'
				},
				{ text: 'Loosens the cover bolts in the reverse of the tightening sequence' },
				{ text: 'Cleans sealing faces without letting debris fall into the engine' },
				{
					text: 'Applies sealant only at the specified joints and fits the new gasket and tube seals'
				},
				{
					text: 'Torques the cover bolts in sequence from the centre outward to specification',
					safety: true
				},
				{ text: 'Checks the crankcase ventilation valve and hoses' },
				{ text: 'Runs the engine to temperature and checks for leaks and misfires' }
			],
			specs: [
				{ label: 'Valve cover bolt torque', value: 10, unit: 'N·m', limit: 'nominal' },
				{ label: 'Sealant bead diameter at joints', value: 3, unit: 'mm', limit: 'nominal' }
			],
			tools: [
				'Torque wrench (low range)',
				'Plastic scraper',
				'Silicone sealant',
				'Parts cleaner',
				'Lint-free rags'
			],
			cautions: [
				'The engine and exhaust are hot after running; let them cool.',
				'Use solvent sparingly with good ventilation.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why are valve cover bolts tightened from the centre outward?',
					options: [
						{
							text: 'To flatten the cover and gasket evenly without trapping a bow',
							correct: true
						},
						{ text: 'Because the centre bolts are longer', correct: false },
						{ text: 'To reduce the time spent', correct: false }
					],
					explanation:
						'Working outward pushes any distortion to the edges rather than locking it in.'
				},
				{
					prompt: 'Why is sealant put only at the specified joints?',
					options: [
						{ text: 'Sealant would stop the cover being removed again', correct: false },
						{
							text: 'Extra sealant can squeeze into the engine and block oil passages, and the gasket is designed to seal dry',
							correct: true
						},
						{ text: 'Sealant is expensive', correct: false }
					],
					explanation: 'Sealant is needed where parts meet at a step; elsewhere it does harm.'
				},
				{
					prompt: 'What happens if cover bolts are over-tightened?',
					options: [
						{ text: 'The seal becomes stronger', correct: false },
						{ text: 'Nothing, as long as the cover is metal', correct: false },
						{
							text: 'The gasket squeezes out or the cover cracks or bends, causing a leak',
							correct: true
						}
					],
					explanation:
						'These bolts need only a low torque; too much distorts the cover or splits the gasket.'
				},
				{
					prompt: 'Oil is found in the spark plug wells. What do you do?',
					options: [
						{
							text: 'Replace the tube seals, clean the wells and check the coils and plugs for damage',
							correct: true
						},
						{ text: 'Ignore it; oil insulates the coils', correct: false },
						{ text: 'Fill the wells with sealant', correct: false }
					],
					explanation:
						'Oil attacks coil boots and can cause misfires by letting the spark track to ground.'
				},
				{
					prompt: 'Why check the crankcase ventilation valve during this job?',
					options: [
						{ text: 'It controls fuel pressure', correct: false },
						{
							text: 'A blocked valve raises crankcase pressure, which pushes oil past gaskets and seals',
							correct: true
						},
						{ text: 'It sets the idle speed', correct: false }
					],
					explanation: 'A new gasket soon leaks again if crankcase pressure is not vented.'
				}
			]
		},
		{
			code: 'ENG-09',
			title: 'Replace spark plugs and torque them to specification',
			description:
				'Remove and inspect spark plugs on a cold engine, check the gap, fit new plugs without cross-threading and torque them to specification.',
			tier: 1,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{ text: 'Confirms the engine is cold and looks up the plug type, gap and torque' },
				{
					text: 'Removes coils and blows debris from the plug wells before removing the plugs',
					safety: true
				},
				{ text: 'Removes the plugs and reads their condition for signs of engine problems' },
				{ text: 'Checks the gap on the new plugs without damaging fine-wire electrodes' },
				{ text: 'Starts each plug by hand to avoid cross-threading' },
				{ text: 'Torques each plug to specification for its seat type', safety: true },
				{
					text: 'Refits coils with dielectric grease on the boots where specified and checks the engine runs smoothly'
				}
			],
			specs: [
				{ label: 'Spark plug gap', value: 1.1, unit: 'mm', limit: 'nominal' },
				{
					label: 'Spark plug torque, gasket seat in aluminium head',
					value: 20,
					unit: 'N·m',
					limit: 'nominal'
				}
			],
			tools: ['Spark plug socket', 'Extensions', 'Torque wrench', 'Wire gap gauge', 'Blow gun'],
			cautions: [
				'Removing plugs from a hot aluminium head can strip the threads.',
				'Wear eye protection when blowing out plug wells.'
			],
			serviceInfo: ['specifications', 'maintenance schedule', 'repair procedure'],
			questions: [
				{
					prompt: 'Why blow out the plug wells before removing the plugs?',
					options: [
						{ text: 'To cool the plugs', correct: false },
						{ text: 'To dry the coil boots', correct: false },
						{
							text: 'So dirt cannot fall into the cylinder when the plug comes out',
							correct: true
						}
					],
					explanation: 'Grit in the cylinder scores the bore and can damage the valves.'
				},
				{
					prompt: 'Why are plugs removed from a cold engine on aluminium heads?',
					options: [
						{
							text: 'Hot aluminium expands and its threads can pull out with the plug',
							correct: true
						},
						{ text: 'Cold plugs are easier to read', correct: false },
						{ text: 'The coils can only be removed cold', correct: false }
					],
					explanation:
						'The head and steel plug expand at different rates, so a hot plug grips harder and can strip the thread.'
				},
				{
					prompt: 'What is the risk of under-tightening a spark plug?',
					options: [
						{ text: 'There is no risk; snug is enough', correct: false },
						{
							text: 'It cannot pass heat to the head properly, so it can overheat, and it may work loose',
							correct: true
						},
						{ text: 'It makes the engine run cooler', correct: false }
					],
					explanation:
						'A plug sheds most of its heat through its seat and threads, which need full contact.'
				},
				{
					prompt:
						'Why is anti-seize not put on plated plugs unless the vehicle maker calls for it?',
					options: [
						{ text: 'It stops the plug sparking', correct: false },
						{ text: 'It makes the plug overheat', correct: false },
						{
							text: 'It acts as a lubricant, so the same torque overtightens the plug',
							correct: true
						}
					],
					explanation:
						'Torque values assume a certain thread friction; reducing it overstretches the plug shell or the head threads.'
				},
				{
					prompt: 'How should you start a new plug in its hole?',
					options: [
						{
							text: 'By hand or with a rubber hose, turning until it seats, before using a wrench',
							correct: true
						},
						{ text: 'With an impact wrench on a low setting', correct: false },
						{ text: 'With a ratchet, pushing hard so it threads straight', correct: false }
					],
					explanation:
						'By hand you feel a crossed thread straight away, before the head is damaged.'
				}
			]
		},
		{
			code: 'ENG-10',
			title: 'Install a cylinder head using the specified bolt torque sequence',
			description:
				'Check the head and block surfaces, clean the bolt holes and tighten new head bolts in the specified sequence and stages, finishing by angle where required.',
			tier: 2,
			requiredLevel: 2,
			minHours: 4,
			checklist: [
				{ text: 'Checks the head and block deck for warpage with a straightedge and feeler gauge' },
				{ text: 'Cleans the bolt holes of oil, coolant and debris', safety: true },
				{ text: 'Fits a new gasket the correct way up over the dowels' },
				{ text: 'Uses new bolts where specified and lubricates them only as the procedure states' },
				{
					text: 'Tightens the bolts in the specified sequence, stage by stage, and finishes by angle',
					safety: true
				},
				{ text: 'Marks each bolt after the angle step so none is missed' }
			],
			specs: [
				{ label: 'Cylinder head warpage', value: 0.05, unit: 'mm', limit: 'maximum' },
				{ label: 'Head bolt torque, first stage', value: 30, unit: 'N·m', limit: 'nominal' },
				{ label: 'Head bolt torque, second stage', value: 60, unit: 'N·m', limit: 'nominal' }
			],
			tools: [
				'Precision straightedge',
				'Feeler gauges',
				'Torque wrench',
				'Torque angle gauge',
				'Thread chaser'
			],
			cautions: [
				'Fluid trapped in a blind bolt hole can crack the block as the bolt is tightened.',
				'Cylinder heads are heavy; lift with help or a hoist.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt:
						'Why are head bolts tightened in a spiral pattern from the centre outward, in stages?',
					options: [
						{ text: 'To line up the camshaft', correct: false },
						{ text: 'To clamp the gasket evenly and avoid distorting the head', correct: true },
						{ text: 'So the job is finished faster', correct: false }
					],
					explanation:
						'Even clamping across the whole gasket is what makes it seal at combustion pressure.'
				},
				{
					prompt: 'Why must blind bolt holes be clean and dry?',
					options: [
						{ text: 'Liquid corrodes the bolts', correct: false },
						{ text: 'Liquid makes the gasket slip', correct: false },
						{
							text: 'Trapped liquid cannot compress; it gives a false torque reading and can crack the block',
							correct: true
						}
					],
					explanation: 'The bolt bottoms on liquid instead of clamping the head.'
				},
				{
					prompt: 'Why finish by angle rather than by a higher torque?',
					options: [
						{
							text: 'Angle controls how far the bolt stretches, which gives a more even clamp than torque alone',
							correct: true
						},
						{ text: 'It is easier for the technician', correct: false },
						{ text: 'Angle steps are only for old engines', correct: false }
					],
					explanation:
						'Thread friction varies, so turning a set angle gives a more consistent bolt stretch and clamp load.'
				}
			]
		},
		{
			code: 'ENG-11',
			title: 'Inspect and replace an engine mount',
			description:
				'Find a failed engine or transmission mount, support the engine safely, replace the mount and torque its fasteners with the powertrain settled in place.',
			tier: 2,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{ text: 'Inspects mounts for cracked or separated rubber and fluid leaks' },
				{
					text: 'Watches for excess engine movement with a helper, standing to the side of the vehicle',
					safety: true
				},
				{
					text: 'Supports the engine with a support bar or a jack and wood block before removing the mount',
					safety: true
				},
				{ text: 'Removes the mount and fits the new one, starting all fasteners by hand' },
				{
					text: 'Lowers the support so the powertrain settles, then torques the fasteners to specification',
					safety: true
				},
				{
					text: 'Checks clearance to hoses and the body and road-tests for vibration',
					safety: true
				}
			],
			specs: [
				{
					label: 'Engine mount through-bolt torque (M12)',
					value: 90,
					unit: 'N·m',
					limit: 'nominal'
				}
			],
			tools: ['Engine support bar', 'Floor jack with wood block', 'Pry bar', 'Torque wrench'],
			cautions: [
				'Never stand in front of or behind a vehicle while checking engine movement in gear.',
				'An unsupported engine can drop when the mount is removed.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why are mount fasteners torqued after the engine has settled on the new mount?',
					options: [
						{ text: 'The torque wrench will not fit otherwise', correct: false },
						{
							text: 'So the mount is not preloaded in a twisted position, which would transmit vibration',
							correct: true
						},
						{ text: 'It makes the bolts easier to reach', correct: false }
					],
					explanation:
						'A mount tightened while pulled out of line carries stress and passes vibration into the body.'
				},
				{
					prompt: 'Why put a block of wood between the jack and the oil pan?',
					options: [
						{ text: 'To insulate the engine', correct: false },
						{ text: 'To raise the engine higher', correct: false },
						{ text: 'To spread the load and avoid denting or cracking the pan', correct: true }
					],
					explanation: 'A jack saddle alone concentrates the load on a thin pan.'
				}
			]
		},
		{
			code: 'ENG-12',
			title: 'Locate an external engine oil leak with dye and ultraviolet light',
			description:
				'Identify the leaking fluid, clean the area, add fluorescent dye and trace the leak to its highest source, allowing for airflow and crankcase pressure.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{ text: 'Identifies the fluid by colour, smell and location' },
				{ text: 'Cleans the suspected area and lets it dry', safety: true },
				{ text: 'Adds the specified amount of dye to the engine oil' },
				{
					text: 'Runs the engine to operating temperature or drives the vehicle as needed',
					safety: true
				},
				{
					text: 'Inspects with the UV lamp and yellow glasses, working from the highest wet point downward'
				},
				{ text: 'Checks the crankcase ventilation system' },
				{ text: 'Records the source with photos and recommends the repair' }
			],
			specs: [],
			tools: [
				'UV leak detection lamp',
				'UV-enhancing glasses',
				'Fluorescent oil dye',
				'Engine degreaser',
				'Inspection mirror'
			],
			cautions: [
				'Keep clear of the fan, belts and hot exhaust while the engine runs.',
				'Degreaser can irritate skin and eyes; use gloves and eye protection.'
			],
			serviceInfo: ['diagnostic procedure', 'repair procedure'],
			questions: [
				{
					prompt: 'Why trace a leak from the highest wet point?',
					options: [
						{
							text: 'Oil runs down and is blown backwards by airflow, so the lowest wet spot is rarely the source',
							correct: true
						},
						{ text: 'The highest point is always the valve cover', correct: false },
						{ text: 'UV light only works from above', correct: false }
					],
					explanation:
						'Gravity and airflow spread oil, so the leak starts above and ahead of where it drips.'
				},
				{
					prompt: 'Why check the crankcase ventilation system when looking for oil leaks?',
					options: [
						{ text: 'It adds dye to the oil', correct: false },
						{
							text: 'A blocked system builds pressure that forces oil out of seals and gaskets',
							correct: true
						},
						{ text: 'It sets the oil level', correct: false }
					],
					explanation:
						'Replacing a seal without fixing high crankcase pressure leads to a repeat leak.'
				}
			]
		}
	]
};
