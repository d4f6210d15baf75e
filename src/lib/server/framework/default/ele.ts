import type { AreaDef } from '../../../framework/types';

export const area: AreaDef = {
	code: 'ELE',
	name: 'Electrical and electronic systems',
	tasks: [
		{
			code: 'ELE-01',
			title: 'Test a 12 V battery and charging system',
			description:
				'Find out whether the battery is charged and healthy, then confirm the generator charges within its regulated range with clean output. Decide whether the battery, the generator or the wiring needs attention.',
			tier: 1,
			requiredLevel: 4,
			minHours: 4,
			checklist: [
				{
					text: 'Puts on eye protection and inspects the case, terminals, cables and hold-down for cracks, leaks and corrosion',
					safety: true
				},
				{ text: 'Removes surface charge and measures open-circuit voltage at the battery posts' },
				{
					text: 'Charges the battery first if it is below the test threshold, with the charger off while clamps go on and come off',
					safety: true
				},
				{ text: 'Runs a conductance or load test with the rated cold-cranking amps entered' },
				{ text: 'Checks drive belt condition and tension and the generator connections' },
				{
					text: 'Starts the engine, holds about 2000 rpm and measures charging voltage at the battery'
				},
				{ text: 'Switches on heavy loads and checks that voltage and output current hold up' },
				{ text: 'Checks generator output for AC ripple with the meter on AC volts' },
				{
					text: 'Cleans and tightens the terminals, refits covers and records every reading',
					safety: true
				}
			],
			specs: [
				{
					label: 'Resting open-circuit voltage, fully charged',
					value: 12.6,
					unit: 'V',
					limit: 'minimum'
				},
				{ label: 'Battery voltage during load test', value: 9.6, unit: 'V', limit: 'minimum' },
				{ label: 'Charging voltage at 2000 rpm', value: 13.5, unit: 'V', limit: 'minimum' },
				{ label: 'Charging voltage at 2000 rpm', value: 14.7, unit: 'V', limit: 'maximum' },
				{
					label: 'AC ripple at the battery, engine running',
					value: 0.5,
					unit: 'V',
					limit: 'maximum'
				}
			],
			tools: [
				'Digital multimeter',
				'Battery conductance tester or carbon-pile load tester',
				'Inductive current clamp',
				'Battery charger',
				'Terminal cleaning brush',
				'Eye protection and gloves'
			],
			cautions: [
				'Batteries give off explosive hydrogen: keep sparks and flames away.',
				'Battery acid burns skin and eyes: wear eye protection and gloves.',
				'Keep hands, hair and leads clear of the belt and fan while the engine runs.'
			],
			serviceInfo: ['specifications', 'diagnostic procedure', 'wiring diagram'],
			questions: [
				{
					prompt:
						'After removing surface charge, a battery rests at 12.2 V. What should you do before a load or conductance test?',
					options: [
						{ text: 'Replace the generator, because it is not charging', correct: false },
						{ text: 'Test it as it is; state of charge does not matter', correct: false },
						{ text: 'Charge the battery fully, then test it', correct: true },
						{ text: 'Replace the battery straight away', correct: false }
					],
					explanation:
						'At about 12.2 V the battery is only around half charged, and testing a partly charged battery gives a false failure, so it must be charged first.'
				},
				{
					prompt: 'Why is surface charge removed before measuring resting battery voltage?',
					options: [
						{ text: 'It stops the conductance tester from reading the CCA rating', correct: false },
						{
							text: 'It makes the voltage read higher than the true state of charge',
							correct: true
						},
						{
							text: 'It makes the voltage read lower than the true state of charge',
							correct: false
						},
						{ text: 'It can damage the meter', correct: false }
					],
					explanation:
						'Charge sitting on the plate surfaces after charging or driving briefly lifts the voltage, so the reading would overstate how charged the battery really is.'
				},
				{
					prompt:
						'With the engine at 2000 rpm and no heavy loads on, battery voltage reads 15.4 V. What is the most likely cause?',
					options: [
						{ text: 'The voltage regulator is not controlling output', correct: true },
						{ text: 'A slipping drive belt', correct: false },
						{ text: 'A battery with a shorted cell pulling voltage down', correct: false },
						{ text: 'Normal output on a warm day', correct: false }
					],
					explanation:
						'Anything above about 14.7 V is overcharging, which points at regulation and will boil the battery and stress electronic modules.'
				},
				{
					prompt:
						'With the engine running, your meter on AC volts reads 1.2 V across the battery. What does this suggest?',
					options: [
						{ text: 'A failed rectifier diode or stator winding in the generator', correct: true },
						{ text: 'A sulfated battery', correct: false },
						{ text: 'A parasitic draw with the key off', correct: false },
						{ text: 'Normal output for a modern generator', correct: false }
					],
					explanation:
						'Generator output should be smooth DC; high AC ripple means the rectifier is letting AC through, usually from a failed diode or stator fault.'
				},
				{
					prompt: 'Which precautions apply when connecting a charger to a battery? Choose two.',
					options: [
						{ text: 'Wear eye protection', correct: true },
						{ text: 'Connect the clamps with the charger on to check for a spark', correct: false },
						{
							text: 'Rest metal tools across the top of the battery to keep them handy',
							correct: false
						},
						{
							text: 'Have the charger switched off before connecting or removing the clamps',
							correct: true
						}
					],
					explanation:
						'A spark at the clamps can ignite hydrogen from the battery, and an explosion throws acid, so the charger is off during connection and eyes are protected.'
				},
				{
					prompt: 'What must be entered into a conductance tester for a valid battery result?',
					options: [
						{ text: "The vehicle's odometer reading", correct: false },
						{ text: 'The engine displacement', correct: false },
						{ text: "The battery's rated cold-cranking amps", correct: true },
						{ text: "The generator's rated output", correct: false }
					],
					explanation:
						'The tester compares the conductance it measures against what a healthy battery of that cold-cranking rating should show.'
				}
			]
		},
		{
			code: 'ELE-02',
			title: 'Perform a starter current draw test',
			description:
				'Measure the current the starter draws, the battery voltage and the cranking speed while cranking, and use them to tell a dragging starter or engine from a high-resistance circuit.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{ text: 'Confirms the battery is charged and passes its test before testing the starter' },
				{
					text: 'Sets the parking brake and selects Park or Neutral',
					safety: true
				},
				{
					text: 'Disables fuel or ignition as the service information directs so the engine cannot start',
					safety: true
				},
				{
					text: 'Zeroes the inductive clamp and fits it around the battery cable, arrow the right way'
				},
				{ text: 'Connects a voltmeter across the battery posts' },
				{
					text: 'Cranks for no more than 15 seconds and reads current, voltage and cranking speed'
				},
				{
					text: 'Lets the starter cool before any repeat crank',
					safety: true
				},
				{ text: 'Compares the readings with the specification and states the likely fault' },
				{
					text: 'Restores fuel or ignition and clears any codes the test set',
					safety: true
				}
			],
			specs: [
				{ label: 'Battery voltage while cranking', value: 9.6, unit: 'V', limit: 'minimum' },
				{ label: 'Starter current draw, small engine', value: 200, unit: 'A', limit: 'maximum' },
				{ label: 'Cranking speed', value: 150, unit: 'rpm', limit: 'minimum' }
			],
			tools: [
				'Inductive ammeter or starting and charging analyser',
				'Digital multimeter',
				'Scan tool',
				'Wheel chocks'
			],
			cautions: [
				'Keep clear of the belt and fan while cranking.',
				'Crank for no more than 15 seconds at a time, then let the starter cool.',
				'Make sure the vehicle is in Park or Neutral with the parking brake on before cranking.'
			],
			serviceInfo: ['specifications', 'diagnostic procedure'],
			questions: [
				{
					prompt:
						'The battery tests good, but the starter draws well above specification and the engine cranks slowly. What is the most likely cause?',
					options: [
						{ text: 'An open starter solenoid winding', correct: false },
						{ text: 'A weak generator', correct: false },
						{ text: 'A dragging starter or an engine that is hard to turn', correct: true },
						{ text: 'High resistance in the starter cables', correct: false }
					],
					explanation:
						'High current with low speed means the starter is working hard against mechanical drag, either inside the starter or in the engine.'
				},
				{
					prompt:
						'The engine cranks slowly, but starter current is well below specification. Where should you look next?',
					options: [
						{ text: 'The fuel pump relay', correct: false },
						{
							text: 'Voltage drop in the cables, connections and solenoid contacts',
							correct: true
						},
						{ text: 'A seized engine', correct: false },
						{ text: 'A shorted starter armature', correct: false }
					],
					explanation:
						'Low current and low speed mean something is limiting current, so resistance in the circuit is the suspect and voltage-drop testing finds it.'
				},
				{
					prompt: 'Why is fuel or ignition disabled before the current draw test?',
					options: [
						{
							text: 'So the engine keeps cranking steadily instead of starting part-way through the reading',
							correct: true
						},
						{ text: 'To protect the inductive clamp from ignition noise', correct: false },
						{
							text: 'Because the starter draws no current if the engine could start',
							correct: false
						}
					],
					explanation:
						'If the engine fires, the reading ends and the vehicle may start unexpectedly, so it is kept from starting while you crank.'
				}
			]
		},
		{
			code: 'ELE-03',
			title: 'Measure voltage drop across a circuit',
			description:
				'Find unwanted resistance in power and ground paths by measuring voltage drop while the circuit carries its normal working current. Narrow the fault to a single connection, switch or wire.',
			tier: 1,
			requiredLevel: 4,
			minHours: 4,
			checklist: [
				{ text: 'Identifies the power and ground paths of the circuit on the wiring diagram' },
				{ text: 'Confirms the battery is charged and the circuit fuse is intact' },
				{ text: 'Sets the meter to DC volts and back-probes without piercing insulation' },
				{ text: 'Switches the circuit on so that normal current is flowing' },
				{ text: 'Measures the power side from battery positive to the load feed terminal' },
				{ text: 'Measures the ground side from the load ground terminal to battery negative' },
				{
					text: 'Splits a high reading across each connector, switch and splice to find the cause'
				},
				{
					text: 'Repairs the fault and re-measures under load to prove the drop is within limit',
					safety: true
				}
			],
			specs: [
				{ label: 'Power side voltage drop at full load', value: 0.5, unit: 'V', limit: 'maximum' },
				{ label: 'Ground side voltage drop at full load', value: 0.2, unit: 'V', limit: 'maximum' },
				{ label: 'Drop across a single connection', value: 0.1, unit: 'V', limit: 'maximum' },
				{
					label: 'Starter positive cable drop while cranking',
					value: 0.5,
					unit: 'V',
					limit: 'maximum'
				}
			],
			tools: [
				'Digital multimeter with min/max recording',
				'Long test leads',
				'Back-probe pins',
				'Wiring diagram'
			],
			cautions: [
				'Remove rings and watches; a short across battery terminals can cause severe burns.',
				'Keep leads clear of the belt and fan when testing while cranking or running.',
				'Do not pierce insulation to probe: it lets in moisture and starts corrosion.'
			],
			serviceInfo: ['wiring diagram', 'diagnostic procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why must the circuit be switched on during a voltage drop test?',
					options: [
						{
							text: 'Voltage drop across a resistance only appears while current flows through it',
							correct: true
						},
						{ text: 'The meter takes its own power from the circuit', correct: false },
						{ text: 'To avoid blowing the meter fuse', correct: false },
						{ text: 'A switched-off circuit shows an even larger drop', correct: false }
					],
					explanation:
						'With no current there is no drop across even a badly corroded joint, so the fault would stay hidden.'
				},
				{
					prompt:
						'With the headlamp on, you read 1.8 V between the lamp ground terminal and battery negative. What does this tell you?',
					options: [
						{ text: 'The lamp filament is open', correct: false },
						{ text: 'The ground path is in good condition', correct: false },
						{ text: 'The lamp fuse has blown', correct: false },
						{ text: 'There is high resistance in the ground path', correct: true }
					],
					explanation:
						'A good ground path drops only a fraction of a volt; 1.8 V means a poor ground is stealing voltage the lamp should be using.'
				},
				{
					prompt:
						'Why is a voltage drop test better than an ohmmeter for finding a corroded connection?',
					options: [
						{
							text: 'Voltage drop tests can be done with the battery disconnected',
							correct: false
						},
						{ text: 'An ohmmeter can only be used on ground circuits', correct: false },
						{
							text: 'A joint held by a few strands can read low ohms at meter current but fail under real load',
							correct: true
						},
						{ text: 'An ohmmeter cannot measure below 1 Ω', correct: false }
					],
					explanation:
						'An ohmmeter pushes a tiny current, so it cannot load the joint the way the real circuit does; voltage drop tests it under working current.'
				},
				{
					prompt:
						'With the circuit switched on, you read 12.4 V across a switch that the operator says is closed. What does this mean?',
					options: [
						{ text: 'The load is shorted to ground', correct: false },
						{ text: 'The battery is low on charge', correct: false },
						{ text: 'The switch contacts are open and not passing current', correct: true },
						{ text: 'The switch is in good condition', correct: false }
					],
					explanation:
						'A closed, healthy switch drops almost nothing; seeing full battery voltage across it means it is open and the whole supply is across the gap.'
				},
				{
					prompt: 'Which of these readings call for a repair? Choose two.',
					options: [
						{ text: '0.3 V for the whole power side of a lamp circuit', correct: false },
						{ text: '0.8 V across the starter positive cable while cranking', correct: true },
						{ text: '0.4 V across a single ground connection with the load on', correct: true },
						{ text: '0.05 V across a connector with the load on', correct: false }
					],
					explanation:
						'Both the starter cable and the single joint exceed their limits, while the other two readings are within typical limits.'
				}
			]
		},
		{
			code: 'ELE-04',
			title: 'Measure and trace a parasitic battery draw',
			description:
				'Measure the current the vehicle draws with everything switched off and the modules asleep, and trace an excessive draw to the circuit and component causing it.',
			tier: 1,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{ text: 'Confirms the battery is charged and every load and accessory is off' },
				{
					text: 'Sets the doors, hood and trunk so the latches read closed and moves the key fob out of range'
				},
				{
					text: 'Installs an ammeter or low-amp clamp with a disconnect switch so the circuit is never broken'
				},
				{
					text: 'Keeps the ignition off and high loads off while the meter is in series',
					safety: true
				},
				{ text: 'Waits the sleep time in the service information before reading the draw' },
				{
					text: 'Finds the circuit by voltage drop across fuses, or by pulling fuses one at a time'
				},
				{ text: 'Uses the wiring diagram to identify and test the component on that circuit' },
				{
					text: 'Repairs, re-measures after the sleep time and confirms the draw is within limit',
					safety: true
				},
				{
					text: 'Reconnects the battery correctly and restores clock, windows and other learned settings',
					safety: true
				}
			],
			specs: [
				{ label: 'Parasitic draw after modules sleep', value: 0.05, unit: 'A', limit: 'maximum' }
			],
			tools: [
				'Digital multimeter with amp and milliamp ranges',
				'Low-amp inductive clamp',
				'Battery disconnect switch',
				'Fuse voltage-drop chart',
				'Wiring diagram',
				'Scan tool'
			],
			cautions: [
				'Do not crank the engine or switch on heavy loads with a meter in series; it can blow the meter or burn the leads.',
				'Disconnecting the battery can erase learned settings and security codes: check before you start.'
			],
			serviceInfo: ['diagnostic procedure', 'wiring diagram', 'specifications'],
			questions: [
				{
					prompt: 'Why do you wait before reading a parasitic draw?',
					options: [
						{
							text: 'Modules stay awake for a while after key-off and draw more current until they sleep',
							correct: true
						},
						{ text: 'The battery needs to cool down first', correct: false },
						{ text: 'The meter needs time to warm up', correct: false },
						{
							text: 'The generator keeps charging for several minutes after shut-off',
							correct: false
						}
					],
					explanation:
						'Reading before the modules sleep captures their normal awake current and makes a healthy vehicle look faulty.'
				},
				{
					prompt: 'After the sleep time, the draw reads 0.32 A. What is the correct conclusion?',
					options: [
						{
							text: 'The meter must be faulty because draw is always in microamps',
							correct: false
						},
						{
							text: 'The draw is excessive and the circuit causing it must be found',
							correct: true
						},
						{ text: 'It is normal for a vehicle with many modules', correct: false }
					],
					explanation:
						'0.32 A is several times the typical limit and would flatten a healthy battery in a few days.'
				},
				{
					prompt:
						'Why is a disconnect switch or clamp used instead of simply removing the cable and connecting the meter?',
					options: [
						{ text: 'The meter cannot measure current in series', correct: false },
						{ text: 'It makes the test faster by skipping the sleep time', correct: false },
						{ text: 'Removing the cable resets the draw to zero permanently', correct: false },
						{
							text: 'Breaking the circuit wakes the modules and restarts the sleep timer',
							correct: true
						}
					],
					explanation:
						'Keeping the circuit unbroken means the modules stay asleep and the reading reflects the real parked draw.'
				},
				{
					prompt:
						'What is the advantage of measuring voltage drop across fuses instead of pulling them?',
					options: [
						{ text: 'It works with the battery disconnected', correct: false },
						{ text: 'It measures the battery state of charge at the same time', correct: false },
						{
							text: 'Nothing is disturbed, so modules stay asleep while you find the live circuit',
							correct: true
						},
						{ text: 'It shows the exact component on the circuit', correct: false }
					],
					explanation:
						'Pulling a fuse can wake modules and change the draw; a small voltage across a fuse shows current is flowing through it without touching it.'
				},
				{
					prompt: 'Which conditions can give a falsely high draw reading? Choose two.',
					options: [
						{ text: 'The hood latched with the under-hood lamp off', correct: false },
						{ text: 'A fully charged battery', correct: false },
						{ text: 'A door open so its courtesy lamp and module stay on', correct: true },
						{ text: 'The key fob left inside the vehicle', correct: true }
					],
					explanation:
						'An open door and a nearby key fob both keep modules awake, so the reading includes current that is not a fault.'
				},
				{
					prompt: 'When you first put a meter in series, which range should you start on?',
					options: [
						{
							text: 'The highest amp range, moving down only once the draw is known to be low',
							correct: true
						},
						{ text: 'The milliamp range, for the best resolution', correct: false },
						{ text: 'The ohms range', correct: false }
					],
					explanation:
						'Modules awake at connection can draw more than the milliamp range handles, so starting high protects the meter fuse and keeps the circuit intact.'
				}
			]
		},
		{
			code: 'ELE-05',
			title: 'Repair wiring with solder and heat-shrink or crimp splices',
			description:
				'Repair damaged wiring so it carries current and resists moisture and vibration as well as the original, using a soldered or crimped splice sealed with adhesive-lined heat-shrink.',
			tier: 1,
			requiredLevel: 4,
			minHours: 4,
			checklist: [
				{
					text: 'Checks the service information to confirm the circuit may be spliced and which method is allowed',
					safety: true
				},
				{
					text: 'Disconnects the battery negative before cutting or splicing',
					safety: true
				},
				{
					text: 'Uses replacement wire of the same or larger size and suitable insulation',
					safety: true
				},
				{ text: 'Strips to the right length without nicking or cutting strands' },
				{ text: 'Staggers splices in a bundle so they do not sit side by side' },
				{
					text: 'Crimps with the correct tool and die, or solders with rosin-core solder, and pull-tests the joint'
				},
				{
					text: 'Seals each splice with adhesive-lined heat-shrink, heated evenly without scorching'
				},
				{
					text: 'Secures the harness in its original route and clips, clear of heat and moving parts',
					safety: true
				},
				{
					text: 'Reconnects the battery and checks circuit operation and voltage drop across the repair',
					safety: true
				}
			],
			specs: [
				{
					label: 'Voltage drop across a finished splice, under load',
					value: 0.1,
					unit: 'V',
					limit: 'maximum'
				}
			],
			tools: [
				'Wire strippers',
				'Ratcheting crimp tool and dies',
				'Soldering iron and rosin-core solder',
				'Adhesive-lined heat-shrink tubing',
				'Heat gun',
				'Digital multimeter'
			],
			cautions: [
				'Soldering irons and heat guns burn skin and can melt nearby parts: shield the area.',
				'Wear eye protection when cutting, stripping and soldering.',
				'Wire that is too small can overheat and start a fire.'
			],
			serviceInfo: ['repair procedure', 'wiring diagram'],
			questions: [
				{
					prompt: 'Why is adhesive-lined heat-shrink used on a splice under the hood?',
					options: [
						{ text: 'The adhesive seals out water so the joint does not corrode', correct: true },
						{ text: 'It makes the splice conduct better', correct: false },
						{ text: 'It replaces the need for a crimp or solder joint', correct: false },
						{ text: 'It is the only shrink tubing that fits automotive wire', correct: false }
					],
					explanation:
						'Moisture wicking into copper strands causes corrosion and resistance, and the melted adhesive closes the ends of the tubing against it.'
				},
				{
					prompt: 'Why must acid-core solder never be used on vehicle wiring?',
					options: [
						{ text: 'The acid flux left behind keeps corroding the copper', correct: true },
						{ text: 'It melts at too low a temperature', correct: false },
						{ text: 'It does not conduct electricity', correct: false },
						{ text: 'It cannot be used with heat-shrink', correct: false }
					],
					explanation:
						'Acid flux residue attacks the strands under the insulation, so the joint fails later; rosin flux does not.'
				},
				{
					prompt: 'What size of wire should be used for a repair section?',
					options: [
						{ text: 'One size smaller so it acts as a fuse', correct: false },
						{ text: 'Any size, as long as the insulation is thick', correct: false },
						{ text: 'Whatever is on hand if the run is short', correct: false },
						{ text: 'The same size as the original or larger', correct: true }
					],
					explanation:
						'Smaller wire has more resistance, so it drops voltage and can overheat at the circuit current.'
				},
				{
					prompt: 'Why are several splices in one bundle staggered along its length?',
					options: [
						{
							text: 'To make each wire a different length for easy identification',
							correct: false
						},
						{
							text: 'Because solder joints must be a set distance from each other to conduct',
							correct: false
						},
						{
							text: 'To avoid a bulky lump and stop neighbouring splices rubbing or shorting together',
							correct: true
						}
					],
					explanation:
						'Splices side by side make a stiff lump that chafes and can let two joints touch, while staggering keeps the bundle slim and the joints apart.'
				},
				{
					prompt: 'Why check the service information before splicing a circuit?',
					options: [
						{ text: 'Splicing always voids the vehicle warranty', correct: false },
						{ text: 'To find out how long the soldering iron needs to heat', correct: false },
						{
							text: 'Some circuits, such as airbag, network or shielded sensor wiring, have special repair rules or must not be spliced',
							correct: true
						},
						{ text: 'To find the wire colour for the heat-shrink', correct: false }
					],
					explanation:
						'A poor repair on a safety or data circuit can disable an airbag or corrupt signals, so the manufacturer decides how, or whether, it may be repaired.'
				},
				{
					prompt: 'What does a firm pull test after crimping confirm?',
					options: [
						{ text: 'That the circuit has no short to ground', correct: false },
						{ text: 'That the heat-shrink has sealed', correct: false },
						{
							text: 'That the crimp has gripped the conductor, not just the insulation',
							correct: true
						}
					],
					explanation:
						'A crimp that has only caught insulation can feel fine in hand but pull apart or go high-resistance with vibration.'
				}
			]
		},
		{
			code: 'ELE-06',
			title: 'Trace a circuit on a wiring diagram',
			description:
				'Use the wiring diagram to follow a circuit from its power source through protection, controls, connectors and load to ground, and choose sensible test points with expected readings.',
			tier: 1,
			requiredLevel: 4,
			minHours: 3,
			checklist: [
				{ text: 'Finds the diagram that matches the vehicle, year and fitted options' },
				{ text: 'Identifies the power source and fuse, and when the feed is live' },
				{
					text: 'Follows the circuit through switches, relays, connectors and splices, noting pins'
				},
				{ text: 'Identifies the load and the ground point that completes the circuit' },
				{ text: 'Reads wire colours and symbols correctly, including the drawn switch positions' },
				{ text: 'Uses the component locator to find connectors and grounds on the vehicle' },
				{ text: 'Chooses test points and states the expected reading in each switch position' },
				{
					text: 'Back-probes or uses a fused jumper, never a bare wire, and confirms a reading on the vehicle',
					safety: true
				}
			],
			specs: [],
			tools: [
				'Service information system',
				'Digital multimeter',
				'Back-probe pins',
				'Fused jumper wires',
				'Printed diagram and highlighter'
			],
			cautions: [
				'Only bridge a circuit with a fused jumper; a bare wire can melt the harness.',
				'Do not force meter probes into connector terminals; spread terminals cause intermittent faults.'
			],
			serviceInfo: ['wiring diagram', 'diagnostic procedure'],
			questions: [
				{
					prompt: 'A wiring diagram shows a door switch drawn open. In what state is it drawn?',
					options: [
						{ text: 'At rest, with nothing operating it', correct: true },
						{ text: 'With the door open', correct: false },
						{ text: 'With the ignition on', correct: false },
						{ text: 'In the failed condition', correct: false }
					],
					explanation:
						'Diagrams show switches in their resting state, usually with the key off and nothing operated, so you must work out how they change when used.'
				},
				{
					prompt: 'Three wires meet at a solid dot on the diagram. What does the dot mean?',
					options: [
						{ text: 'The wires are joined at a splice and are electrically common', correct: true },
						{ text: 'The wires cross without connecting', correct: false },
						{ text: 'There is a fuse at that point', correct: false },
						{ text: 'The wires go to ground there', correct: false }
					],
					explanation:
						'A dot marks a splice, so a fault on one branch can affect everything connected to that point.'
				},
				{
					prompt: 'With the ignition off, which fuse should have voltage on both sides?',
					options: [
						{ text: 'A fuse the diagram shows as live at all times', correct: true },
						{ text: 'A fuse the diagram shows as live in run only', correct: false },
						{ text: 'A fuse fed from the starter relay', correct: false }
					],
					explanation:
						'Only circuits fed directly from the battery are live with the key off; run-only feeds come through the ignition switch or a relay.'
				},
				{
					prompt:
						'Two lamps on different circuits both glow dimly, and the diagram shows they share one ground point. Where do you test first?',
					options: [
						{ text: 'The battery state of charge', correct: false },
						{ text: 'Both fuses', correct: false },
						{ text: 'The shared ground point and its connection', correct: true },
						{ text: 'Each lamp bulb', correct: false }
					],
					explanation:
						'When several circuits misbehave together, the diagram points to what they have in common, here the ground.'
				},
				{
					prompt: 'Why confirm the vehicle build and options before trusting a diagram?',
					options: [
						{
							text: 'Different options and trims can use different wiring, pins and connectors',
							correct: true
						},
						{ text: 'Diagrams only cover the base model', correct: false },
						{
							text: 'Wire colours are the same on every vehicle, so it does not matter',
							correct: false
						}
					],
					explanation:
						'Testing the wrong pin because the diagram is for another build wastes time and can lead to a wrong repair.'
				}
			]
		},
		{
			code: 'ELE-07',
			title: 'Diagnose an exterior lighting circuit',
			description:
				'Find why a headlamp, tail, stop or turn lamp is out, dim or behaving strangely, whether it is switched directly or commanded by a body module.',
			tier: 2,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{ text: 'Verifies the complaint and checks every lamp on related circuits' },
				{
					text: 'Inspects the bulb or LED unit and socket for corrosion, melting and loose terminals'
				},
				{
					text: 'Checks the fuse, relay or module command, using the scan tool where lamps are module-driven'
				},
				{ text: 'Back-probes the lamp connector and measures voltage with the lamp switched on' },
				{ text: 'Measures voltage drop on the feed and ground sides to find resistance' },
				{
					text: 'Disconnects discharge headlamp power before opening the lamp',
					safety: true
				},
				{
					text: 'Repairs, checks all lamps and re-aims the headlamps if they were disturbed',
					safety: true
				}
			],
			specs: [
				{
					label: 'Combined feed and ground voltage drop at the lamp',
					value: 0.5,
					unit: 'V',
					limit: 'maximum'
				}
			],
			tools: ['Digital multimeter', 'Back-probe pins', 'Scan tool', 'Headlamp aiming equipment'],
			cautions: [
				'Discharge headlamp igniters produce very high voltage: disconnect before servicing.',
				'Halogen bulbs run hot enough to burn: let them cool first.'
			],
			serviceInfo: ['wiring diagram', 'diagnostic procedure', 'repair procedure'],
			questions: [
				{
					prompt:
						'On a vehicle with filament bulbs, the left turn signal flashes much faster than the right. What is the most likely cause?',
					options: [
						{ text: 'The right side has an extra bulb', correct: false },
						{ text: 'A bulb is out or has a poor connection on the left side', correct: true },
						{ text: 'The flasher is set for trailer towing', correct: false },
						{ text: 'The battery voltage is high', correct: false }
					],
					explanation:
						'The flasher speeds up when the current it sees drops, which happens when one bulb on that side is not lighting.'
				},
				{
					prompt:
						'A tail lamp is dim. The battery reads 12.6 V, but only 10.8 V across the lamp terminals with it on. What is your next step?',
					options: [
						{ text: 'Measure voltage drop on the feed side and ground side', correct: true },
						{ text: 'Fit a higher-wattage bulb', correct: false },
						{ text: 'Replace the battery', correct: false },
						{ text: 'Replace the light switch', correct: false }
					],
					explanation:
						'1.8 V is being lost somewhere in the circuit, and voltage-drop testing each side shows whether it is the feed or the ground.'
				},
				{
					prompt: 'Why should you not touch the glass of a halogen bulb with bare fingers?',
					options: [
						{ text: 'Fingerprints change the beam colour permanently', correct: false },
						{
							text: 'Skin oil creates hot spots on the glass and shortens bulb life',
							correct: true
						},
						{ text: 'The glass carries high voltage', correct: false }
					],
					explanation:
						'Halogen glass runs very hot, and oil residue makes it overheat locally and fail early.'
				}
			]
		},
		{
			code: 'ELE-08',
			title: 'Test fuses, relays and circuit protection',
			description:
				'Test fuses and relays in and out of the circuit, find why a fuse blew before replacing it, and fit only the specified protection.',
			tier: 2,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{ text: 'Identifies the fuse or relay from the wiring diagram and box label' },
				{
					text: 'Tests the fuse in place with the circuit on, checking voltage at both test points'
				},
				{
					text: 'Finds the cause of a blown fuse before fitting a new one',
					safety: true
				},
				{
					text: 'Replaces a fuse only with the same rating and type',
					safety: true
				},
				{ text: 'Measures relay coil resistance and checks the control side for power and ground' },
				{
					text: 'Energises the relay coil with correct polarity through a fused jumper',
					safety: true
				},
				{ text: 'Measures voltage drop across the closed relay contacts under load' },
				{ text: 'Verifies circuit operation after the repair' }
			],
			specs: [
				{ label: 'Relay coil resistance', value: 75, unit: 'Ω', limit: 'nominal' },
				{
					label: 'Voltage drop across closed relay contacts, under load',
					value: 0.2,
					unit: 'V',
					limit: 'maximum'
				},
				{
					label: 'Voltage drop across a good fuse, under load',
					value: 0.1,
					unit: 'V',
					limit: 'maximum'
				}
			],
			tools: [
				'Digital multimeter',
				'Fused jumper wires',
				'Relay test leads',
				'Fuse puller',
				'Wiring diagram'
			],
			cautions: [
				'Never fit a fuse of higher rating than specified; the wiring can overheat and burn.',
				'Do not use a filament test light on module or sensor circuits; it can draw enough current to damage them.'
			],
			serviceInfo: ['wiring diagram', 'specifications'],
			questions: [
				{
					prompt: 'A new fuse blows as soon as the circuit is switched on. What does this mean?',
					options: [
						{ text: 'The fuse rating is too low and should be increased', correct: false },
						{ text: 'The replacement fuse was faulty', correct: false },
						{ text: 'The circuit has an open', correct: false },
						{ text: 'There is a short to ground that must be found', correct: true }
					],
					explanation:
						'An immediate blow means excessive current, usually a short to ground, and a larger fuse would only let the wiring overheat.'
				},
				{
					prompt:
						'With the circuit on, one test point of a fuse reads 12.5 V and the other reads 0 V. What does this show?',
					options: [
						{ text: 'There is no power to the fuse box', correct: false },
						{ text: 'The load is shorted', correct: false },
						{ text: 'The fuse is open', correct: true },
						{ text: 'The fuse is good', correct: false }
					],
					explanation:
						'Supply on one side and nothing on the other means the fuse element is not conducting.'
				},
				{
					prompt: 'Why must a relay with a built-in diode be powered with the correct polarity?',
					options: [
						{ text: 'Reversed, the contacts close the other way round', correct: false },
						{ text: 'Polarity does not matter for any relay', correct: false },
						{
							text: 'Reversed, the diode conducts like a short and can blow the fuse or destroy the diode',
							correct: true
						}
					],
					explanation:
						'The diode is fitted to soak up the coil voltage spike and conducts freely when powered the wrong way.'
				}
			]
		},
		{
			code: 'ELE-09',
			title: 'Check CAN network termination and bus voltages',
			description:
				'When modules stop communicating, check the high-speed CAN bus for correct termination resistance and signal voltages to separate a wiring fault from a module fault.',
			tier: 2,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{
					text: 'Scans all modules and records communication codes and which modules do not respond'
				},
				{
					text: 'Switches the ignition off, disconnects the battery and lets the bus power down before measuring resistance'
				},
				{ text: 'Measures resistance between CAN high and CAN low at the diagnostic connector' },
				{ text: 'Interprets the reading: two terminators, one missing, or lines shorted together' },
				{ text: 'Checks each bus line for shorts to ground and to battery voltage' },
				{ text: 'Reconnects the battery and measures each line to ground with the bus active' },
				{
					text: 'Unplugs modules one at a time, as the procedure allows, to isolate one pulling the bus down'
				},
				{
					text: 'Repairs the fault, clears codes and confirms every module communicates',
					safety: true
				}
			],
			specs: [
				{ label: 'Bus resistance, CAN high to CAN low', value: 60, unit: 'Ω', limit: 'nominal' },
				{ label: 'Each terminating resistor', value: 120, unit: 'Ω', limit: 'nominal' },
				{
					label: 'CAN high and CAN low at rest, to ground',
					value: 2.5,
					unit: 'V',
					limit: 'nominal'
				},
				{
					label: 'CAN high while transmitting, to ground',
					value: 3.5,
					unit: 'V',
					limit: 'nominal'
				},
				{ label: 'CAN low while transmitting, to ground', value: 1.5, unit: 'V', limit: 'nominal' }
			],
			tools: [
				'Scan tool',
				'Digital multimeter',
				'Diagnostic connector breakout box',
				'Lab scope',
				'Wiring diagram'
			],
			cautions: [
				'Do not force oversize probes into connector pins; spread terminals cause lost communication.',
				'Disconnecting modules or the battery may need relearns afterwards: check first.'
			],
			serviceInfo: ['wiring diagram', 'diagnostic procedure'],
			questions: [
				{
					prompt:
						'Resistance between CAN high and CAN low at the diagnostic connector reads 120 Ω. What does it suggest?',
					options: [
						{ text: 'CAN low is shorted to ground', correct: false },
						{ text: 'One terminating resistor, or the wiring to it, is open', correct: true },
						{ text: 'The bus is correctly terminated', correct: false },
						{ text: 'CAN high is shorted to CAN low', correct: false }
					],
					explanation:
						'Two 120 Ω resistors in parallel give about 60 Ω, so reading 120 Ω means only one is still connected.'
				},
				{
					prompt: 'Why is bus resistance measured with the battery disconnected?',
					options: [
						{ text: 'It makes the modules transmit', correct: false },
						{ text: 'An ohmmeter gives false readings on a powered circuit', correct: true },
						{ text: 'The terminating resistors only exist with the battery off', correct: false }
					],
					explanation:
						'An ohmmeter supplies its own small current, and any voltage on the bus upsets the reading.'
				},
				{
					prompt: 'On the standard diagnostic connector, which pins carry high-speed CAN?',
					options: [
						{ text: 'Pins 6 and 14', correct: true },
						{ text: 'Pins 4 and 5', correct: false },
						{ text: 'Pins 7 and 15', correct: false },
						{ text: 'Pin 16 only', correct: false }
					],
					explanation:
						'Pins 6 and 14 are CAN high and CAN low, while 4 and 5 are grounds and 16 is battery power.'
				}
			]
		},
		{
			code: 'ELE-10',
			title: 'Diagnose a power window or power door lock circuit',
			description:
				'Find why a power window or door lock does not work from one or more switches, tracing the fault to a switch, module, wiring, motor or mechanism.',
			tier: 2,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{
					text: 'Operates the window or lock from every switch and notes what works and what does not'
				},
				{
					text: 'Checks the fuse and, on networked doors, the module inputs and commands on the scan tool'
				},
				{ text: 'Removes the door trim with trim tools without breaking clips' },
				{
					text: 'Keeps hands clear of the glass and regulator whenever the motor is operated with the trim off',
					safety: true
				},
				{
					text: 'Back-probes the motor and checks the supply reverses polarity between up and down'
				},
				{ text: 'Measures feed and ground voltage drop under load' },
				{ text: 'Checks the glass runs freely in its channels and the regulator is not binding' },
				{
					text: 'Repairs, runs the initialisation so auto-up and pinch protection work, and verifies',
					safety: true
				}
			],
			specs: [
				{
					label: 'Voltage drop in motor feed and ground, under load',
					value: 0.5,
					unit: 'V',
					limit: 'maximum'
				}
			],
			tools: [
				'Trim removal tools',
				'Digital multimeter',
				'Back-probe pins',
				'Scan tool',
				'Wiring diagram'
			],
			cautions: [
				'Window glass and regulators can trap fingers: keep hands clear when operating.',
				'Auto-up pinch protection may not work until it has been relearned.',
				'Sheet-metal edges inside doors are sharp: wear gloves.'
			],
			serviceInfo: ['wiring diagram', 'repair procedure', 'diagnostic procedure'],
			questions: [
				{
					prompt:
						'A rear window works from the driver master switch but not from its own door switch. Where is the fault?',
					options: [
						{ text: 'In the window motor', correct: false },
						{ text: 'In the window regulator', correct: false },
						{ text: 'In the main fuse', correct: false },
						{
							text: 'In the rear door switch or the wiring between it and the circuit',
							correct: true
						}
					],
					explanation:
						'The motor and regulator are proven by the master switch, so only the part used by the door switch alone is left.'
				},
				{
					prompt:
						'Why is an initialisation run after a window motor is replaced or the battery disconnected?',
					options: [
						{ text: 'To break in the new motor brushes', correct: false },
						{ text: 'To set the door lock code', correct: false },
						{ text: 'So auto-up and pinch protection know the window travel', correct: true }
					],
					explanation:
						'Without learned end positions, auto-up may be disabled or the pinch protection may not stop the glass on a hand.'
				},
				{
					prompt:
						'Neither the master nor the door switch moves a window, and there is no voltage at the motor in either direction. What do you check first?',
					options: [
						{ text: 'The glass channels for binding', correct: false },
						{ text: 'The feed, fuse and ground common to both switches', correct: true },
						{ text: 'The window motor', correct: false }
					],
					explanation:
						'No voltage from either switch points to something both depend on, before the motor is even considered.'
				}
			]
		},
		{
			code: 'ELE-11',
			title: 'Disable and handle supplemental restraint components safely',
			description:
				'Make the airbag and pretensioner system safe before working on or near it, handle and store live components correctly, and restore the system and its warning lamp afterwards.',
			tier: 1,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{ text: 'Looks up the component locations and the disabling procedure' },
				{
					text: 'Centres and locks the steering wheel before any clockspring or column work',
					safety: true
				},
				{
					text: 'Switches the ignition off, disconnects and insulates the battery negative cable, and any second battery',
					safety: true
				},
				{
					text: 'Waits the specified time for the reserve energy to drain before touching SRS connectors',
					safety: true
				},
				{
					text: 'Disconnects SRS connectors as directed, keeping out of the deployment path',
					safety: true
				},
				{
					text: 'Carries a live airbag with its cover away from the body and sets it down cover up',
					safety: true
				},
				{
					text: 'Never probes an airbag or pretensioner with a meter or test light',
					safety: true
				},
				{
					text: 'Reconnects and locks all SRS connectors, then reconnects the battery with nobody in the vehicle',
					safety: true
				},
				{
					text: 'Confirms the warning lamp does its check and goes out, and scans for codes',
					safety: true
				}
			],
			specs: [],
			tools: [
				'Service information',
				'Insulating boot or tape for the battery cable',
				'Trim removal tools',
				'Torque wrench',
				'Scan tool'
			],
			cautions: [
				'An airbag deploys with enough force to cause serious injury: stay out of its path.',
				'Wait the specified time after disconnecting the battery before touching SRS connectors.',
				'Never probe an airbag or pretensioner with a meter or test light.',
				'Deployed airbags can be hot and dusty: wear gloves and eye protection.'
			],
			serviceInfo: ['repair procedure', 'diagnostic procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why wait after disconnecting the battery before touching airbag connectors?',
					options: [
						{ text: 'The battery terminal needs time to discharge', correct: false },
						{
							text: 'The restraint module stores reserve energy that can still fire an airbag',
							correct: true
						},
						{ text: 'To let the airbag gas cool', correct: false },
						{ text: 'To let the module save its fault codes', correct: false }
					],
					explanation:
						'The module keeps enough energy to deploy in a crash even if the battery is torn away, and that energy takes time to drain.'
				},
				{
					prompt: 'How should you carry a live driver airbag?',
					options: [
						{ text: 'With the trim cover facing away from your body', correct: true },
						{ text: 'With the trim cover against your chest', correct: false },
						{ text: 'By its connector wires', correct: false },
						{ text: 'Under your arm with the cover facing down', correct: false }
					],
					explanation:
						'If it fires, the bag and cover leave the trim side, so that side must point away from you.'
				},
				{
					prompt: 'How should a live airbag be set down on a bench?',
					options: [
						{ text: 'Trim cover facing up, clear of other items', correct: true },
						{ text: 'Trim cover facing down to protect it', correct: false },
						{ text: 'On its edge against a wall', correct: false },
						{ text: 'Under the bench where it cannot be seen', correct: false }
					],
					explanation:
						'Face down, a deployment would launch the unit into the air, while face up the bag opens upward without throwing the housing.'
				},
				{
					prompt: 'Why must an airbag never be measured with an ohmmeter?',
					options: [
						{ text: 'The meter current could be enough to fire the igniter', correct: true },
						{ text: 'Airbags have no resistance to measure', correct: false },
						{ text: 'It would erase the module codes', correct: false }
					],
					explanation:
						'Igniters need very little current, so SRS circuits are tested only with the tools and methods the procedure names.'
				},
				{
					prompt: 'What must be true before you reconnect the battery after SRS work? Choose two.',
					options: [
						{ text: 'The ignition is switched on', correct: false },
						{ text: 'The warning lamp bulb has been removed', correct: false },
						{ text: 'All SRS connectors are reconnected and their locks engaged', correct: true },
						{ text: 'Nobody is inside the vehicle or in front of an airbag', correct: true }
					],
					explanation:
						'An unlocked connector sets faults, and if a fault fires a bag on reconnection nobody should be in its path.'
				},
				{
					prompt: 'After the work, the airbag warning lamp stays on. What is the correct action?',
					options: [
						{ text: 'Scan for codes and diagnose before releasing the vehicle', correct: true },
						{
							text: 'Release the vehicle, because the lamp clears itself after a few drives',
							correct: false
						},
						{ text: 'Clear the codes and release the vehicle', correct: false }
					],
					explanation:
						'A lit lamp means the system may not deploy in a crash, so the fault must be found and fixed.'
				}
			]
		},
		{
			code: 'ELE-12',
			title: 'Prepare a vehicle for module replacement and programming',
			description:
				'Set up the vehicle, power supply and scan equipment so a control module can be replaced and programmed without interruption, then complete the relearns it needs.',
			tier: 3,
			requiredLevel: 2,
			minHours: 2,
			checklist: [
				{
					text: 'Confirms by diagnosis that the module is at fault and checks for service bulletins and updates'
				},
				{ text: 'Records part and calibration numbers and saves the module configuration' },
				{
					text: 'Connects a programming-rated battery maintainer, not a boost charger',
					safety: true
				},
				{ text: 'Switches off all loads, closes doors and keeps the laptop on mains power' },
				{ text: 'Wears a grounding strap when handling the new module' },
				{
					text: 'Does not interrupt programming by opening doors, turning the key or moving cables',
					safety: true
				},
				{
					text: 'Completes the relearns the module needs, clears codes and verifies operation',
					safety: true
				}
			],
			specs: [
				{ label: 'System voltage during programming', value: 13.0, unit: 'V', limit: 'minimum' },
				{ label: 'System voltage during programming', value: 14.5, unit: 'V', limit: 'maximum' }
			],
			tools: [
				'Programming-rated battery maintainer',
				'Scan tool or pass-through programming interface',
				'Laptop with mains charger',
				'Grounding wrist strap',
				'Digital multimeter'
			],
			cautions: [
				'Low or unstable voltage during programming can leave a module unusable.',
				'Static discharge can damage module electronics: ground yourself before handling.'
			],
			serviceInfo: ['repair procedure', 'service bulletin', 'diagnostic procedure'],
			questions: [
				{
					prompt: 'Why is a battery maintainer connected before programming a module?',
					options: [
						{ text: 'It stops the scan tool from overheating', correct: false },
						{
							text: 'A voltage drop part-way through programming can corrupt the module',
							correct: true
						},
						{ text: 'Programming needs more than 16 V', correct: false },
						{ text: 'It speeds up the download', correct: false }
					],
					explanation:
						'Programming can take a long time with modules awake, and the battery alone may sag below the level needed to write software safely.'
				},
				{
					prompt: 'Why record the configuration of the old module before removing it?',
					options: [
						{ text: 'The old module must be returned with its settings erased', correct: false },
						{ text: 'It is needed to order the correct battery', correct: false },
						{
							text: 'The new module needs the vehicle options and settings loaded into it',
							correct: true
						}
					],
					explanation:
						'A blank module does not know what the vehicle is fitted with, and features will not work until the configuration is restored.'
				}
			]
		}
	]
};
